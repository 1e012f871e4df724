import { AsyncLocalStorage } from 'node:async_hooks'
import { setTimeout as sleep } from 'node:timers/promises'
import type BetterSqlite3 from 'better-sqlite3'
import type { Database, Row, SqlValue } from './database'

const STATEMENT_CACHE_LIMIT = 1000
/** How long a statement keeps retrying while another connection (the import worker) holds the write lock. */
const BUSY_GIVE_UP_MS = 60_000

/** SQLite's own text form of a UTC time, as TypeORM writes it, so every timestamp sorts together. */
export function sqliteTime(date: Date): string {
  // A batch writes one time on every row: convert it once.
  if (date.getTime() === lastTime.ms) return lastTime.text
  const text = date.toISOString().replace('T', ' ').replace('Z', '')
  lastTime = { ms: date.getTime(), text }
  return text
}
let lastTime = { ms: Number.NaN, text: '' }

function bind(params: readonly SqlValue[]): unknown[] {
  return params.map((value) => {
    if (typeof value === 'boolean') return value ? 1 : 0
    if (value instanceof Date) return sqliteTime(value)
    return value
  })
}

function isBusy(error: unknown): boolean {
  const code = (error as { code?: string }).code
  return code === 'SQLITE_BUSY' || code === 'SQLITE_BUSY_SNAPSHOT' || code === 'SQLITE_LOCKED'
}

/**
 * The port on one better-sqlite3 connection. better-sqlite3 is synchronous, so
 * a statement never lets another request in; a transaction that awaits would,
 * so while one is open every statement from outside it waits its turn. When
 * another connection (the import worker) holds the write lock, a write waits
 * by yielding to the event loop, never by blocking it (the connection's own
 * busy timeout is 0).
 */
export class SqliteDatabase implements Database {
  readonly dialect = 'sqlite' as const
  private readonly statements = new Map<string, BetterSqlite3.Statement>()
  private readonly context = new AsyncLocalStorage<SqliteDatabase>()
  /** The end of the line of transactions open or waiting; a statement from outside waits for the ones ahead of it. */
  private queue: Promise<void> = Promise.resolve()
  private waiting = 0

  /** `busyGiveUpMs`: how long a statement retries while another connection holds the write lock. */
  constructor(
    readonly handle: BetterSqlite3.Database,
    private readonly busyGiveUpMs = BUSY_GIVE_UP_MS,
  ) {
    handle.pragma('busy_timeout = 0')
  }

  /** `pluck`: a statement of its own that answers the first column's values. */
  private statement(sql: string, pluck = false): BetterSqlite3.Statement {
    const key = pluck ? `pluck:${sql}` : sql
    let statement = this.statements.get(key)
    if (!statement) {
      if (this.statements.size >= STATEMENT_CACHE_LIMIT) this.statements.clear()
      statement = this.handle.prepare(sql)
      if (pluck) statement.pluck()
      this.statements.set(key, statement)
    }
    return statement
  }

  /** Waits for the transactions ahead (opened by someone else); statements inside one run at once. */
  private async turn(): Promise<void> {
    if (this.waiting === 0 || this.context.getStore() === this) return
    await this.queue
  }

  private async retrying<T>(work: () => T): Promise<T> {
    const started = Date.now()
    for (let wait = 5; ; wait = Math.min(wait * 2, 100)) {
      try {
        return work()
      } catch (error) {
        if (!isBusy(error) || Date.now() - started > this.busyGiveUpMs) throw error
        await sleep(wait)
      }
    }
  }

  async all<T = Row>(sql: string, params: readonly SqlValue[] = []): Promise<T[]> {
    await this.turn()
    return this.retrying(() => this.statement(sql).all(...bind(params)) as T[])
  }

  async column<T extends SqlValue = number>(sql: string, params: readonly SqlValue[] = []): Promise<T[]> {
    await this.turn()
    return this.retrying(() => this.statement(sql, true).all(...bind(params)) as T[])
  }

  async get<T = Row>(sql: string, params: readonly SqlValue[] = []): Promise<T | undefined> {
    await this.turn()
    return this.retrying(() => this.statement(sql).get(...bind(params)) as T | undefined)
  }

  async run(sql: string, params: readonly SqlValue[] = []): Promise<{ changes: number }> {
    await this.turn()
    return this.retrying(() => ({ changes: this.statement(sql).run(...bind(params)).changes }))
  }

  async insert(sql: string, params: readonly SqlValue[] = []): Promise<number> {
    const row = await this.get<{ id: number }>(sql, params)
    if (!row || typeof row.id !== 'number') throw new Error('An insert through the port must end with RETURNING "id".')
    return row.id
  }

  transaction<T>(work: (tx: Database) => Promise<T>): Promise<T> {
    return this.within('BEGIN IMMEDIATE', work)
  }

  exclusively<T>(_key: string, work: (tx: Database) => Promise<T>): Promise<T> {
    return work(this)
  }

  /** WAL: a deferred transaction reads one snapshot while other connections write. */
  snapshot<T>(work: (tx: Database) => Promise<T>): Promise<T> {
    return this.within('BEGIN DEFERRED', work)
  }

  private async within<T>(begin: string, work: (tx: Database) => Promise<T>): Promise<T> {
    if (this.context.getStore() === this) return work(this)
    // Take a place in line synchronously, so nothing that starts after this call can slip in ahead.
    const ahead = this.queue
    let release!: () => void
    this.queue = new Promise<void>((resolve) => (release = resolve))
    this.waiting++
    await ahead
    try {
      await this.retrying(() => this.handle.exec(begin))
      return await this.context.run(this, async () => {
        try {
          const result = await work(this)
          this.handle.exec('COMMIT')
          return result
        } catch (error) {
          if (this.handle.inTransaction) this.handle.exec('ROLLBACK')
          throw error
        }
      })
    } finally {
      this.waiting--
      release()
    }
  }
}
