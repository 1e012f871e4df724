import type { PartKind } from '../../shared/schemas/part-kinds'
import type { Database, SqlValue } from '../db/database'
import { afterPrefix } from './part-words'
import type { SearchTiers } from './search-order'

export type PartSearch = { key: string; words: string[] }

/**
 * Search over indexes only, in three tiers: the normalised number and mark
 * keys exactly, then as a prefix (a range `>= key AND < next`), then the
 * part_word index for words of the name and family (every query word the
 * prefix of some word of the part). Each tier answers ids alone; ordering and
 * paging are pageOfHits', over the part numbers held in memory.
 */
export class PartSearchRepository {
  constructor(private readonly db: Database) {}

  async tiers(query: PartSearch): Promise<SearchTiers> {
    const ids = (sql: string, params: SqlValue[]) => this.db.column<number>(sql, params)
    const tiers: SearchTiers = []
    if (query.key) {
      const end = afterPrefix(query.key)
      tiers.push(
        await ids('SELECT "id" FROM part WHERE "partKey" = ? UNION SELECT "partId" FROM part_mark WHERE "valueKey" = ?', [
          query.key,
          query.key,
        ]),
        await ids(
          'SELECT "id" FROM part WHERE "partKey" >= ? AND "partKey" < ? UNION SELECT "partId" FROM part_mark WHERE "valueKey" >= ? AND "valueKey" < ?',
          [query.key, end, query.key, end],
        ),
      )
    }
    if (query.words.length) {
      const each = query.words.map(() => 'SELECT "partId" AS "id" FROM part_word WHERE "word" >= ? AND "word" < ?')
      tiers.push(
        await ids(
          each.join(' INTERSECT '),
          query.words.flatMap((word) => [word, afterPrefix(word)]),
        ),
      )
    }
    return tiers
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
