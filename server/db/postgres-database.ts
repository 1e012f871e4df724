import { AsyncLocalStorage } from 'node:async_hooks'
import pg from 'pg'
import type { Database, Row, SqlValue } from './database'

/*
 * Counts and ids come back as numbers, as from SQLite: int8 (COUNT, bigint
 * columns) and numeric would otherwise be strings. Timestamps without a zone
 * are UTC, as the server writes them (sessions run with timezone UTC, see
 * data-source.ts), not the machine's local time.
 */
pg.types.setTypeParser(pg.types.builtins.INT8, (value) => Number(value))
pg.types.setTypeParser(pg.types.builtins.NUMERIC, (value) => Number(value))
pg.types.setTypeParser(pg.types.builtins.TIMESTAMP, (value) => new Date(`${value.replace(' ', 'T')}Z`))
pg.defaults.parseInputDatesAsUTC = true

/** `?` placeholders numbered for PostgreSQL; a `?` inside a quoted string or identifier is left alone. */
export function numberPlaceholders(sql: string): string {
  let index = 0
  let quote: string | null = null
  let out = ''
  for (const char of sql) {
    if (quote) {
      if (char === quote) quote = null
      out += char
    } else if (char === "'" || char === '"') {
      quote = char
      out += char
    } else if (char === '?') {
      out += `$${++index}`
    } else {
      out += char
    }
  }
  return out
}

function bind(params: readonly SqlValue[]): unknown[] {
  return params.map((value) => (typeof value === 'bigint' ? value.toString() : value))
}

type Queryable = Pick<pg.Pool | pg.PoolClient, 'query'>

/** The port on a pg pool: a transaction holds one client; statements made from inside it join it. */
export class PostgresDatabase implements Database {
  readonly dialect = 'postgres' as const
  private readonly context = new AsyncLocalStorage<pg.PoolClient>()
  private readonly texts = new Map<string, string>()

  constructor(readonly pool: pg.Pool) {}

  private text(sql: string): string {
    let text = this.texts.get(sql)
    if (text === undefined) {
      if (this.texts.size > 2000) this.texts.clear()
      text = numberPlaceholders(sql)
      this.texts.set(sql, text)
    }
    return text
  }

  private client(): Queryable {
    return this.context.getStore() ?? this.pool
  }

  async all<T = Row>(sql: string, params: readonly SqlValue[] = []): Promise<T[]> {
    const result = await this.client().query(this.text(sql), bind(params))
    return result.rows as T[]
  }

  async column<T extends SqlValue = number>(sql: string, params: readonly SqlValue[] = []): Promise<T[]> {
    const result = await this.client().query({ text: this.text(sql), values: bind(params), rowMode: 'array' })
    return (result.rows as unknown[][]).map((row) => row[0] as T)
  }

  async get<T = Row>(sql: string, params: readonly SqlValue[] = []): Promise<T | undefined> {
    return (await this.all<T>(sql, params))[0]
  }

  async run(sql: string, params: readonly SqlValue[] = []): Promise<{ changes: number }> {
    const result = await this.client().query(this.text(sql), bind(params))
    return { changes: result.rowCount ?? 0 }
  }

  async insert(sql: string, params: readonly SqlValue[] = []): Promise<number> {
    const row = await this.get<{ id: number }>(sql, params)
    if (!row || typeof row.id !== 'number') throw new Error('An insert through the port must end with RETURNING "id".')
    return row.id
  }

  transaction<T>(work: (tx: Database) => Promise<T>): Promise<T> {
    return this.within('BEGIN', work)
  }

  exclusively<T>(key: string, work: (tx: Database) => Promise<T>): Promise<T> {
    return this.transaction(async (tx) => {
      await tx.run('SELECT pg_advisory_xact_lock(hashtext(?)) IS NULL AS "held"', [key])
      return work(tx)
    })
  }

  snapshot<T>(work: (tx: Database) => Promise<T>): Promise<T> {
    return this.within('BEGIN ISOLATION LEVEL REPEATABLE READ READ ONLY', work)
  }

  private async within<T>(begin: string, work: (tx: Database) => Promise<T>): Promise<T> {
    if (this.context.getStore()) return work(this)
    const client = await this.pool.connect()
    try {
      await client.query(begin)
      const result = await this.context.run(client, () => work(this))
      await client.query('COMMIT')
      return result
    } catch (error) {
      await client.query('ROLLBACK').catch(() => undefined)
      throw error
    } finally {
      client.release()
    }
  }
}
