import { chunks, type Database } from '../../db/database'
import type { Tick } from '../import-jobs'
import { changeRecorder } from '../../audit/change-log'
import type { LinksPlan } from './link-plan'
import { insertProposedModification } from '../../fitment/link-rows'
import type { CatalogueChanges } from '../../fitment/fit-graph'

/** Rows per multi-row insert: 250 links of 8 parameters stay under every driver's limit. */
const ROWS_PER_INSERT = 250

/** The new rows' ids by "a:b", from an insert's `RETURNING "id", "partAId", "partBId"` (a pair is unique). */
type NewRow = { id: number; partAId: number; partBId: number }

function idsByPair(rows: readonly NewRow[]) {
  return new Map(rows.map((row) => [`${row.partAId}:${row.partBId}`, row.id]))
}

/** Writes a links plan; the caller holds the transaction. Answers the links and identities it touched. */
export async function writeLinks(
  db: Database,
  plan: LinksPlan,
  batchId: number,
  now: Date,
  tick: Tick = () => {},
): Promise<Required<Pick<CatalogueChanges, 'links' | 'identities'>>> {
  const links: number[] = []
  const identities: number[] = []
  const record = changeRecorder(db, batchId)

  const modificationIds = new Map(plan.modificationIds)
  for (const name of plan.newModifications) {
    modificationIds.set(name, await insertProposedModification(db, name, 'import', batchId))
  }
  const linkMods = async (linkId: number, names: string[]) => {
    for (const name of names)
      await db.run('INSERT INTO link_modification ("linkId", "modificationId") VALUES (?, ?)', [linkId, modificationIds.get(name)!])
  }

  for (const stored of plan.linkDeletes) {
    await record('link', stored.record.id, 'deleted', stored.record.batchId, { link: [stored.record], link_modification: stored.mods })
    await db.run('DELETE FROM link WHERE "id" = ?', [stored.record.id])
    links.push(stored.record.id)
    tick()
  }
  for (const stored of plan.identityDeletes) {
    await record('identity', stored.id, 'deleted', stored.batchId, { part_identity: [stored] })
    await db.run('DELETE FROM part_identity WHERE "id" = ?', [stored.id])
    identities.push(stored.id)
    tick()
  }
  for (const { stored, values } of plan.linkUpdates) {
    const { id } = stored.record
    await record('link', id, 'updated', stored.record.batchId, { link: [stored.record], link_modification: stored.mods })
    await db.run(
      `UPDATE link SET "relation" = ?, "note" = ?, "source" = ?, "status" = 'approved', "batchId" = ?, "updatedAt" = ? WHERE "id" = ?`,
      [values.relation, values.note, values.source, batchId, now, id],
    )
    links.push(id)
    if (stored.names.join('\n') !== values.modifications.join('\n')) {
      await db.run('DELETE FROM link_modification WHERE "linkId" = ?', [id])
      await linkMods(id, values.modifications)
    }
    tick()
  }
  for (const { stored, note, source } of plan.identityUpdates) {
    await record('identity', stored.id, 'updated', stored.batchId, { part_identity: [stored] })
    await db.run('UPDATE part_identity SET "note" = ?, "source" = ?, "batchId" = ? WHERE "id" = ?', [note, source, batchId, stored.id])
    identities.push(stored.id)
    tick()
  }
  // New links and identities go in several rows a statement; the rows come back in no set order, so their ids are matched by pair.
  for (const chunk of chunks(plan.linkCreates, ROWS_PER_INSERT)) {
    const ids = idsByPair(
      await db.all<NewRow>(
        `INSERT INTO link ("partAId", "partBId", "relation", "note", "source", "status", "batchId", "createdAt", "updatedAt")
         VALUES ${chunk.map(() => "(?, ?, ?, ?, ?, 'approved', ?, ?, ?)").join(', ')} RETURNING "id", "partAId", "partBId"`,
        chunk.flatMap(({ a, b, values }) => [a, b, values.relation, values.note, values.source, batchId, now, now]),
      ),
    )
    const mods = chunk.flatMap(({ a, b, values }) =>
      values.modifications.map((name) => [ids.get(`${a}:${b}`)!, modificationIds.get(name)!]),
    )
    for (const rows of chunks(mods, ROWS_PER_INSERT)) {
      await db.run(`INSERT INTO link_modification ("linkId", "modificationId") VALUES ${rows.map(() => '(?, ?)').join(', ')}`, rows.flat())
    }
    for (const { a, b } of chunk) {
      links.push(ids.get(`${a}:${b}`)!)
      tick()
    }
  }
  for (const chunk of chunks(plan.identityCreates, ROWS_PER_INSERT)) {
    const ids = idsByPair(
      await db.all<NewRow>(
        `INSERT INTO part_identity ("partAId", "partBId", "note", "source", "batchId", "createdAt")
         VALUES ${chunk.map(() => '(?, ?, ?, ?, ?, ?)').join(', ')} RETURNING "id", "partAId", "partBId"`,
        chunk.flatMap(({ a, b, note, source }) => [a, b, note, source, batchId, now]),
      ),
    )
    for (const { a, b } of chunk) {
      identities.push(ids.get(`${a}:${b}`)!)
      tick()
    }
  }
  return { links, identities }
}
