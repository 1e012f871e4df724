import type { QuoteListQuery } from '../../shared/schemas/quotes'
import { quoteIdOfJobNumber } from '../../shared/quote-job-number'
import type { Database, SqlValue } from '../db/database'

export type QuoteRow = {
  id: number
  status: 'draft' | 'accepted'
  customer: string
  buildSheetId: number | null
  body: string
  createdByName: string
  reservedUntil: unknown
  createdAt: unknown
}
export type NewQuote = { customer: string; buildSheetId: number | null; body: string; searchText: string; createdByName: string }

const COLUMNS = 'SELECT "id", "status", "customer", "buildSheetId", "body", "createdByName", "reservedUntil", "createdAt" FROM quote'

/** `%`, `_` and the escape itself match only themselves in a LIKE pattern. */
const likeLiteral = (text: string) => text.replace(/[\\%_]/g, (char) => `\\${char}`)

/**
 * The search's WHERE: the lower-case search text holds the words, or the
 * words are a job number (its id is the primary key). A pattern with a leading
 * % cannot use an index, so the list is read a page at a time by id.
 */
function searchClause(q: string): { clause: string; params: SqlValue[] } {
  if (!q) return { clause: '', params: [] }
  const id = quoteIdOfJobNumber(q)
  const like = `%${likeLiteral(q.toLowerCase())}%`
  return id === null
    ? { clause: ` WHERE "searchText" LIKE ? ESCAPE '\\'`, params: [like] }
    : { clause: ` WHERE ("searchText" LIKE ? ESCAPE '\\' OR "id" = ?)`, params: [like, id] }
}

/** The quote and quote_unit tables. */
export class QuoteRepository {
  constructor(private readonly db: Database) {}

  /** The quote and the stock units it names, in one transaction. */
  insert(quote: NewQuote, stockItemIds: readonly number[]): Promise<number> {
    return this.db.transaction(async (tx) => {
      const id = await tx.insert(
        'INSERT INTO quote ("status", "customer", "buildSheetId", "body", "searchText", "createdByName", "createdAt") VALUES (\'draft\', ?, ?, ?, ?, ?, ?) RETURNING "id"',
        [quote.customer, quote.buildSheetId, quote.body, quote.searchText, quote.createdByName, new Date()],
      )
      for (const unitId of new Set(stockItemIds)) {
        await tx.run('INSERT INTO quote_unit ("quoteId", "stockItemId") VALUES (?, ?)', [id, unitId])
      }
      return id
    })
  }

  byId(id: number): Promise<QuoteRow | undefined> {
    return this.db.get<QuoteRow>(`${COLUMNS} WHERE "id" = ?`, [id])
  }

  /** One page of the quotes the search finds, newest first, and how many it finds in all. */
  async page(query: QuoteListQuery): Promise<{ rows: QuoteRow[]; total: number }> {
    const { clause, params } = searchClause(query.q)
    const counted = await this.db.get<{ total: number }>(`SELECT CAST(COUNT(*) AS INTEGER) AS "total" FROM quote${clause}`, params)
    const rows = await this.db.all<QuoteRow>(`${COLUMNS}${clause} ORDER BY "id" DESC LIMIT ? OFFSET ?`, [
      ...params,
      query.pageSize,
      (query.page - 1) * query.pageSize,
    ])
    return { rows, total: Number(counted?.total ?? 0) }
  }
}
