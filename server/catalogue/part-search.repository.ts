import type { PartKind } from '../../shared/schemas/part-kinds'
import type { Database, SqlValue } from '../db/database'
import { afterPrefix } from './part-words'

export type PartSearch = { key: string; words: string[]; kind?: PartKind; limit: number; offset: number }

/** How a part matched: lower ranks first. */
const EXACT = 0
const PREFIX = 1
const WORD = 2

/**
 * Search over indexes only: the normalised number and mark keys (exact, then
 * prefix as a range `>= key AND < next`), and the part_word index for words
 * of the name and family (every query word the prefix of some word of the part).
 */
export class PartSearchRepository {
  constructor(private readonly db: Database) {}

  async search(query: PartSearch): Promise<{ ids: number[]; total: number }> {
    const hits: string[] = []
    const params: SqlValue[] = []
    if (query.key) {
      const end = afterPrefix(query.key)
      hits.push(
        `SELECT p."id" AS "id", ${EXACT} AS "rank" FROM part p WHERE p."partKey" = ?`,
        `SELECT m."partId" AS "id", ${EXACT} AS "rank" FROM part_mark m WHERE m."valueKey" = ?`,
        `SELECT p."id" AS "id", ${PREFIX} AS "rank" FROM part p WHERE p."partKey" >= ? AND p."partKey" < ?`,
        `SELECT m."partId" AS "id", ${PREFIX} AS "rank" FROM part_mark m WHERE m."valueKey" >= ? AND m."valueKey" < ?`,
      )
      params.push(query.key, query.key, query.key, end, query.key, end)
    }
    if (query.words.length) {
      const each = query.words.map(() => 'SELECT w."partId" FROM part_word w WHERE w."word" >= ? AND w."word" < ?')
      hits.push(`SELECT "partId" AS "id", ${WORD} AS "rank" FROM (${each.join(' INTERSECT ')}) AS "words"`)
      for (const word of query.words) params.push(word, afterPrefix(word))
    }
    if (hits.length === 0) return { ids: [], total: 0 }
    const kind = query.kind ? ' WHERE p."kind" = ?' : ''
    const kindParams: SqlValue[] = query.kind ? [query.kind] : []
    const best = `WITH "hits" AS (${hits.join(' UNION ALL ')}),
      "best" AS (SELECT "id", MIN("rank") AS "rank" FROM "hits" GROUP BY "id")`
    const count = await this.db.get<{ total: number }>(
      `${best} SELECT CAST(COUNT(*) AS INTEGER) AS "total" FROM "best" b JOIN part p ON p."id" = b."id"${kind}`,
      [...params, ...kindParams],
    )
    const rows = await this.db.all<{ id: number }>(
      `${best} SELECT b."id" AS "id" FROM "best" b JOIN part p ON p."id" = b."id"${kind} ORDER BY b."rank", p."partNumber" LIMIT ? OFFSET ?`,
      [...params, ...kindParams, query.limit, query.offset],
    )
    return { ids: rows.map((row) => row.id), total: count?.total ?? 0 }
  }

  /** Without search text: the catalogue (of a kind) in part-number order. */
  async browse(kind: PartKind | undefined, limit: number, offset: number): Promise<{ ids: number[]; total: number }> {
    const where = kind ? ' WHERE "kind" = ?' : ''
    const params: SqlValue[] = kind ? [kind] : []
    const count = await this.db.get<{ total: number }>(`SELECT CAST(COUNT(*) AS INTEGER) AS "total" FROM part${where}`, params)
    const rows = await this.db.all<{ id: number }>(`SELECT "id" FROM part${where} ORDER BY "partNumber" LIMIT ? OFFSET ?`, [
      ...params,
      limit,
      offset,
    ])
    return { ids: rows.map((row) => row.id), total: count?.total ?? 0 }
  }
}
