import type Database from 'better-sqlite3'
import type { LinkSource, Relation, ReviewStatus } from '../../shared/schemas/fitment'
import { unknownModification } from '../catalogue/unknown-modification'

/*
 * Raw, synchronous writes of links, identities and the modifications they
 * name, for use inside one `inTransaction` (hand edits, the demo seed, the
 * import's writer shares the proposed-modification insert).
 */

/** Fit is mutual: a pair is stored once, lower id first. */
export function orderedPair([a, b]: [number, number]): [number, number] {
  return a < b ? [a, b] : [b, a]
}

/** A modification an import or an editor named before anyone described it: proposed, for an editor to complete. */
export function proposedModificationInserter(db: Database.Database, source: 'import' | 'editor') {
  const stub = unknownModification('')
  const insert = db.prepare(
    `INSERT INTO modification (name, title, summary, steps, extraParts, consumables, skillLevel, timeMinutes, cautions, status, source, batchId)
     VALUES (@name, @name, @summary, '[]', '[]', '[]', @skillLevel, NULL, '[]', 'proposed', @source, @batchId)`,
  )
  return (name: string, batchId: number | null) =>
    Number(insert.run({ name, summary: stub.summary, skillLevel: stub.skillLevel, source, batchId }).lastInsertRowid)
}

/** Modification ids by name, creating a proposed entry for a name the catalogue does not know. */
export function modificationIds(db: Database.Database, names: string[], batchId: number | null, source: 'import' | 'editor'): number[] {
  const find = db.prepare('SELECT id FROM modification WHERE name = ?')
  const create = proposedModificationInserter(db, source)
  return names.map((name) => (find.get(name) as { id: number } | undefined)?.id ?? create(name, batchId))
}

export function setLinkModifications(db: Database.Database, linkId: number, modificationIdList: number[]) {
  db.prepare('DELETE FROM link_modification WHERE linkId = ?').run(linkId)
  const insert = db.prepare('INSERT INTO link_modification (linkId, modificationId) VALUES (?, ?)')
  for (const id of modificationIdList) insert.run(linkId, id)
}

export type LinkRowInput = {
  partIds: [number, number]
  relation: Relation
  modifications: string[]
  note: string
  source: LinkSource
  status: ReviewStatus
  batchId: number | null
}

export function insertLinkRow(db: Database.Database, input: LinkRowInput): number {
  const [a, b] = orderedPair(input.partIds)
  const id = Number(
    db
      .prepare('INSERT INTO link (partAId, partBId, relation, note, source, status, batchId) VALUES (?, ?, ?, ?, ?, ?, ?)')
      .run(a, b, input.relation, input.note, input.source, input.status, input.batchId).lastInsertRowid,
  )
  setLinkModifications(db, id, modificationIds(db, input.modifications, input.batchId, input.source === 'import' ? 'import' : 'editor'))
  return id
}

export function insertIdentityRow(
  db: Database.Database,
  input: { partIds: [number, number]; note: string; source: LinkSource; batchId: number | null },
): number {
  const [a, b] = orderedPair(input.partIds)
  return Number(
    db
      .prepare('INSERT INTO part_identity (partAId, partBId, note, source, batchId) VALUES (?, ?, ?, ?, ?)')
      .run(a, b, input.note, input.source, input.batchId).lastInsertRowid,
  )
}

/**
 * What already joins two parts: a pair holds one relation, either a fit link
 * or an identity (imports enforce the same).
 */
export function pairHolder(db: Database.Database, [a, b]: [number, number]): 'link' | 'identity' | null {
  const [low, high] = orderedPair([a, b])
  if (db.prepare('SELECT 1 FROM link WHERE partAId = ? AND partBId = ?').get(low, high)) return 'link'
  if (db.prepare('SELECT 1 FROM part_identity WHERE partAId = ? AND partBId = ?').get(low, high)) return 'identity'
  return null
}
