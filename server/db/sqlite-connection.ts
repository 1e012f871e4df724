import type BetterSqlite3 from 'better-sqlite3'
import type { DataSource, EntityManager } from 'typeorm'
import type pg from 'pg'
import type { Database } from './database'
import { PostgresDatabase } from './postgres-database'
import { SqliteDatabase } from './sqlite-database'

function isDatabase(value: unknown): value is BetterSqlite3.Database {
  return (
    typeof value === 'object' &&
    value !== null &&
    typeof (value as { prepare?: unknown }).prepare === 'function' &&
    typeof (value as { inTransaction?: unknown }).inTransaction === 'boolean'
  )
}

/**
 * The better-sqlite3 handle under TypeORM. TypeORM keeps one connection for
 * SQLite; the port (`databaseOf`) runs on the same one.
 */
export function sqliteConnection(source: DataSource | EntityManager): BetterSqlite3.Database {
  const driver = 'driver' in source ? source.driver : source.dataSource.driver
  const connection: unknown = 'databaseConnection' in driver ? driver.databaseConnection : undefined
  if (driver.options.type !== 'better-sqlite3' || !isDatabase(connection)) {
    throw new Error('Bulk catalogue writes need the better-sqlite3 driver.')
  }
  return connection
}

const ports = new WeakMap<DataSource, Database>()

/** The data port of an initialised data source (one per data source, so every caller shares its turn-taking). */
export function databaseOf(dataSource: DataSource): Database {
  let port = ports.get(dataSource)
  if (!port) {
    if (dataSource.options.type === 'postgres') {
      const pool = (dataSource.driver as unknown as { master?: pg.Pool }).master
      if (!pool) throw new Error('The PostgreSQL data source is not initialised.')
      port = new PostgresDatabase(pool)
    } else {
      port = new SqliteDatabase(sqliteConnection(dataSource))
    }
    ports.set(dataSource, port)
  }
  return port
}
