/**
 * The one way the server reaches its tables: repositories write SQL against
 * this port, and an adapter runs it on SQLite (the embedded default) or, later,
 * PostgreSQL.
 *
 * SQL written for it must run on both: `?` placeholders (the PostgreSQL adapter
 * numbers them), double-quoted camelCase identifiers ("partAId"), `RETURNING`
 * for new ids, no `datetime('now')` (pass a Date), no `group_concat`, and
 * `CAST(COUNT(*) AS INTEGER)` so counts come back as numbers.
 */
export type SqlValue = string | number | bigint | boolean | null | Date | Buffer
export type Row = Record<string, unknown>

export type Dialect = 'sqlite' | 'postgres'

export interface Database {
  readonly dialect: Dialect
  all<T = Row>(sql: string, params?: readonly SqlValue[]): Promise<T[]>
  get<T = Row>(sql: string, params?: readonly SqlValue[]): Promise<T | undefined>
  /** The first column of every row, without an object per row: for long id lists. */
  column<T extends SqlValue = number>(sql: string, params?: readonly SqlValue[]): Promise<T[]>
  run(sql: string, params?: readonly SqlValue[]): Promise<{ changes: number }>
  /** Runs an `INSERT … RETURNING "id"` and answers the new id. */
  insert(sql: string, params?: readonly SqlValue[]): Promise<number>
  /**
   * Runs `work` in one transaction: all of it is written, or none. Statements
   * made through `tx` (or through this database from inside `work`) join it;
   * other requests wait until it ends, so keep slow work (hashing, files) out.
   */
  transaction<T>(work: (tx: Database) => Promise<T>): Promise<T>
  /** Runs `work` reading one moment of the database, however long it takes and whoever writes meanwhile (long exports). */
  snapshot<T>(work: (tx: Database) => Promise<T>): Promise<T>
  /**
   * Runs `work` while no other server runs work under the same `key`: a job
   * every server runs on its beat, done by one at a time. On SQLite one server
   * owns the file, so it just runs; on PostgreSQL it holds a lock on the key
   * in a transaction of its own.
   */
  exclusively<T>(key: string, work: (tx: Database) => Promise<T>): Promise<T>
}

/** `?, ?, ?` for a list of values. */
export function placeholders(count: number): string {
  return Array.from({ length: count }, () => '?').join(', ')
}

/** Splits a long id list so `IN (…)` stays under every driver's parameter limit. */
export function* chunks<T>(items: readonly T[], size = 500): Generator<T[]> {
  for (let start = 0; start < items.length; start += size) yield items.slice(start, start + size)
}

/** A timestamp as either driver hands it back (SQLite: UTC text without zone; PostgreSQL: Date). */
export function toIsoTime(value: unknown): string {
  if (value instanceof Date) return value.toISOString()
  const text = String(value)
  return new Date(/[zZ]|[+-]\d\d:?\d\d$/.test(text) ? text : `${text.replace(' ', 'T')}Z`).toISOString()
}

/**
 * A `WHERE` condition matching rows of `alias` that hold one of `pairCount`
 * id pairs: an OR of the pairs, which both drivers answer through the
 * (partAId, partBId) index (a row-value `IN` scans the table on SQLite, and a
 * join to a VALUES list lets its planner start from the table). Bind the pairs
 * flattened, two parameters each.
 */
export function pairCondition(alias: string, pairCount: number): string {
  const key = `${alias}:${pairCount}`
  let text = pairConditions.get(key)
  if (text === undefined) {
    text = Array.from({ length: pairCount }, () => `(${alias}."partAId" = ? AND ${alias}."partBId" = ?)`).join(' OR ')
    pairConditions.set(key, text)
  }
  return text
}
const pairConditions = new Map<string, string>()
