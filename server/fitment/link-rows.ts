import type { LinkSource, Relation, ReviewStatus } from '../../shared/schemas/fitment'
import { unknownModification } from '../catalogue/unknown-modification'
import type { Database } from '../db/database'

/*
 * Writes of links, identities and the modifications they name through the
 * data port, inside the caller's transaction (hand edits, reviews of field
 * reports, the demo seed, imports), on SQLite or PostgreSQL.
 */

/** Fit is mutual: a pair is stored once, lower id first. */
export function orderedPair([a, b]: [number, number]): [number, number] {
  return a < b ? [a, b] : [b, a]
}

const INSERT_PROPOSED_MODIFICATION = `INSERT INTO modification ("name", "title", "summary", "steps", "extraParts", "consumables", "skillLevel", "timeMinutes", "cautions", "status", "source", "batchId")
  VALUES (?, ?, ?, '[]', '[]', '[]', ?, NULL, '[]', 'proposed', ?, ?)`

function proposedValues(name: string, source: 'import' | 'editor', batchId: number | null) {
  const stub = unknownModification('')
  return [name, name, stub.summary, stub.skillLevel, source, batchId] as const
}

/** A modification an import or an editor named before anyone described it: proposed, for an editor to complete. */
export function insertProposedModification(
  db: Database,
  name: string,
  source: 'import' | 'editor',
  batchId: number | null,
): Promise<number> {
  return db.insert(`${INSERT_PROPOSED_MODIFICATION} RETURNING "id"`, proposedValues(name, source, batchId))
}

/** Modification ids by name, creating a proposed entry for a name the catalogue does not know. */
export async function modificationIds(
  db: Database,
  names: string[],
  batchId: number | null,
  source: 'import' | 'editor',
): Promise<number[]> {
  const ids: number[] = []
  for (const name of names) {
    const found = await db.get<{ id: number }>('SELECT "id" FROM modification WHERE "name" = ?', [name])
    ids.push(found ? Number(found.id) : await insertProposedModification(db, name, source, batchId))
  }
  return ids
}

export async function setLinkModifications(db: Database, linkId: number, modificationIdList: number[]) {
  await db.run('DELETE FROM link_modification WHERE "linkId" = ?', [linkId])
  for (const id of modificationIdList)
    await db.run('INSERT INTO link_modification ("linkId", "modificationId") VALUES (?, ?)', [linkId, id])
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

export async function insertLinkRow(db: Database, input: LinkRowInput): Promise<number> {
  const [a, b] = orderedPair(input.partIds)
  const now = new Date()
  const id = await db.insert(
    `INSERT INTO link ("partAId", "partBId", "relation", "note", "source", "status", "batchId", "createdAt", "updatedAt")
     VALUES (?, ?, ?, ?, ?, ?, ?, ?, ?) RETURNING "id"`,
    [a, b, input.relation, input.note, input.source, input.status, input.batchId, now, now],
  )
  const source = input.source === 'import' ? 'import' : 'editor'
  await setLinkModifications(db, id, await modificationIds(db, input.modifications, input.batchId, source))
  return id
}

export function insertIdentityRow(
  db: Database,
  input: { partIds: [number, number]; note: string; source: LinkSource; batchId: number | null },
): Promise<number> {
  const [a, b] = orderedPair(input.partIds)
  return db.insert(
    'INSERT INTO part_identity ("partAId", "partBId", "note", "source", "batchId", "createdAt") VALUES (?, ?, ?, ?, ?, ?) RETURNING "id"',
    [a, b, input.note, input.source, input.batchId, new Date()],
  )
}

/**
 * What already joins two parts: a pair holds one relation, either a fit link
 * or an identity (imports enforce the same).
 */
export async function pairHolder(db: Database, [a, b]: [number, number]): Promise<'link' | 'identity' | null> {
  const pair = orderedPair([a, b])
  if (await db.get('SELECT 1 AS "found" FROM link WHERE "partAId" = ? AND "partBId" = ?', pair)) return 'link'
  if (await db.get('SELECT 1 AS "found" FROM part_identity WHERE "partAId" = ? AND "partBId" = ?', pair)) return 'identity'
  return null
}
