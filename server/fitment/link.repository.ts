import type { LinkSource, Relation, ReviewStatus } from '../../shared/schemas/fitment'
import type { PartKind } from '../../shared/schemas/part-kinds'
import { chunks, placeholders, type Database } from '../db/database'
import type { FitDetails, IdentityDetail, LinkDetail } from './graph/fit-details'

export type LinkGraphRow = { id: number; a: number; b: number; relation: Relation; status: ReviewStatus }
export type IdentityGraphRow = { id: number; a: number; b: number }
/** `attributes` is the stored JSON text, as the rules' classes key it. */
export type PartGraphRow = { id: number; partNumber: string; kind: PartKind; attributes: string; yearTo: number | null }
type DetailRow = { id: number; note: string; source: LinkSource }
type ModificationNameRow = { linkId: number; name: string }

const LINK_GRAPH_COLUMNS = 'SELECT "id", "partAId" AS "a", "partBId" AS "b", "relation", "status" FROM link'
const IDENTITY_GRAPH_COLUMNS = 'SELECT "id", "partAId" AS "a", "partBId" AS "b" FROM part_identity'
const PART_GRAPH_COLUMNS = 'SELECT "id", "partNumber", "kind", "attributes", "yearTo" FROM part'

/**
 * The link, part_identity and link_modification tables as the fit graph reads
 * them: whole tables in id order, a page at a time (start-up), rows by id
 * (deltas), and the details of the links an answer shows.
 */
export class LinkRepository implements FitDetails {
  constructor(private readonly db: Database) {}

  /** Up to `limit` rows with an id above `after`, in id order (keyset paging, so each page is an index range). */
  linkPage(after: number, limit: number): Promise<LinkGraphRow[]> {
    return this.db.all<LinkGraphRow>(`${LINK_GRAPH_COLUMNS} WHERE "id" > ? ORDER BY "id" LIMIT ?`, [after, limit])
  }

  identityPage(after: number, limit: number): Promise<IdentityGraphRow[]> {
    return this.db.all<IdentityGraphRow>(`${IDENTITY_GRAPH_COLUMNS} WHERE "id" > ? ORDER BY "id" LIMIT ?`, [after, limit])
  }

  partPage(after: number, limit: number): Promise<PartGraphRow[]> {
    return this.db.all<PartGraphRow>(`${PART_GRAPH_COLUMNS} WHERE "id" > ? ORDER BY "id" LIMIT ?`, [after, limit])
  }

  linksById(ids: readonly number[]): Promise<LinkGraphRow[]> {
    return this.byIds<LinkGraphRow>(LINK_GRAPH_COLUMNS, ids)
  }

  identitiesById(ids: readonly number[]): Promise<IdentityGraphRow[]> {
    return this.byIds<IdentityGraphRow>(IDENTITY_GRAPH_COLUMNS, ids)
  }

  partsById(ids: readonly number[]): Promise<PartGraphRow[]> {
    return this.byIds<PartGraphRow>(PART_GRAPH_COLUMNS, ids)
  }

  async links(ids: readonly number[]): Promise<Map<number, LinkDetail>> {
    const found = new Map<number, LinkDetail>()
    for (const row of await this.byIds<DetailRow>('SELECT "id", "note", "source" FROM link', ids)) {
      found.set(row.id, { ...row, modifications: [] })
    }
    for (const list of chunks([...found.keys()])) {
      const names = await this.db.all<ModificationNameRow>(
        `SELECT lm."linkId", m."name" FROM link_modification lm JOIN modification m ON m."id" = lm."modificationId"
         WHERE lm."linkId" IN (${placeholders(list.length)})`,
        list,
      )
      for (const { linkId, name } of names) found.get(linkId)?.modifications.push(name)
    }
    for (const detail of found.values()) detail.modifications.sort(byCodePoint)
    return found
  }

  async identities(ids: readonly number[]): Promise<Map<number, IdentityDetail>> {
    const rows = await this.byIds<DetailRow>('SELECT "id", "note", "source" FROM part_identity', ids)
    return new Map(rows.map((row) => [row.id, row]))
  }

  private async byIds<T>(select: string, ids: readonly number[]): Promise<T[]> {
    const rows: T[] = []
    for (const list of chunks([...new Set(ids)]))
      rows.push(...(await this.db.all<T>(`${select} WHERE "id" IN (${placeholders(list.length)})`, list)))
    return rows
  }
}

export function byCodePoint(a: string, b: string): number {
  return a < b ? -1 : a > b ? 1 : 0
}
