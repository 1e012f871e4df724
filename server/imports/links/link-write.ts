import type Database from 'better-sqlite3'
import type { Tick } from '../import-jobs'
import { SQL_NOW, changeRecorder } from '../../audit/change-log'
import type { LinksPlan } from './link-plan'
import { proposedModificationInserter } from '../../fitment/link-rows'
import type { CatalogueChanges } from '../../fitment/fit-graph'

/** Writes a links plan with prepared statements; the caller holds the transaction. Answers the links and identities it touched. */
export function writeLinks(
  db: Database.Database,
  plan: LinksPlan,
  batchId: number,
  tick: Tick = () => {},
): Required<Pick<CatalogueChanges, 'links' | 'identities'>> {
  const links: number[] = []
  const identities: number[] = []
  const insertModification = proposedModificationInserter(db, 'import')
  const insertLink = db.prepare(
    "INSERT INTO link (partAId, partBId, relation, note, source, status, batchId) VALUES (?, ?, ?, ?, ?, 'approved', ?)",
  )
  const updateLink = db.prepare(
    `UPDATE link SET relation = ?, note = ?, source = ?, status = 'approved', batchId = ?, updatedAt = ${SQL_NOW} WHERE id = ?`,
  )
  const deleteLink = db.prepare('DELETE FROM link WHERE id = ?')
  const insertLinkMod = db.prepare('INSERT INTO link_modification (linkId, modificationId) VALUES (?, ?)')
  const deleteLinkMods = db.prepare('DELETE FROM link_modification WHERE linkId = ?')
  const insertIdentity = db.prepare('INSERT INTO part_identity (partAId, partBId, note, source, batchId) VALUES (?, ?, ?, ?, ?)')
  const updateIdentity = db.prepare('UPDATE part_identity SET note = ?, source = ?, batchId = ? WHERE id = ?')
  const deleteIdentity = db.prepare('DELETE FROM part_identity WHERE id = ?')
  const record = changeRecorder(db, batchId)

  const modificationIds = new Map(plan.modificationIds)
  for (const name of plan.newModifications) {
    modificationIds.set(name, insertModification(name, batchId))
  }
  const linkMods = (linkId: number, names: string[]) => {
    for (const name of names) insertLinkMod.run(linkId, modificationIds.get(name)!)
  }

  for (const stored of plan.linkDeletes) {
    record('link', stored.record.id, 'deleted', stored.record.batchId, { link: [stored.record], link_modification: stored.mods })
    deleteLink.run(stored.record.id)
    links.push(stored.record.id)
    tick()
  }
  for (const stored of plan.identityDeletes) {
    record('identity', stored.id, 'deleted', stored.batchId, { part_identity: [stored] })
    deleteIdentity.run(stored.id)
    identities.push(stored.id)
    tick()
  }
  for (const { stored, values } of plan.linkUpdates) {
    const { id } = stored.record
    record('link', id, 'updated', stored.record.batchId, { link: [stored.record], link_modification: stored.mods })
    updateLink.run(values.relation, values.note, values.source, batchId, id)
    links.push(id)
    if (stored.names.join('\n') !== values.modifications.join('\n')) {
      deleteLinkMods.run(id)
      linkMods(id, values.modifications)
    }
    tick()
  }
  for (const { stored, note, source } of plan.identityUpdates) {
    record('identity', stored.id, 'updated', stored.batchId, { part_identity: [stored] })
    updateIdentity.run(note, source, batchId, stored.id)
    identities.push(stored.id)
    tick()
  }
  for (const { a, b, values } of plan.linkCreates) {
    const linkId = Number(insertLink.run(a, b, values.relation, values.note, values.source, batchId).lastInsertRowid)
    linkMods(linkId, values.modifications)
    links.push(linkId)
    tick()
  }
  for (const { a, b, note, source } of plan.identityCreates) {
    identities.push(Number(insertIdentity.run(a, b, note, source, batchId).lastInsertRowid))
    tick()
  }
  return { links, identities }
}
