import type Database from 'better-sqlite3'
import type { DataSource, EntityManager } from 'typeorm'

function isDatabase(value: unknown): value is Database.Database {
  return (
    typeof value === 'object' &&
    value !== null &&
    typeof (value as { prepare?: unknown }).prepare === 'function' &&
    typeof (value as { inTransaction?: unknown }).inTransaction === 'boolean'
  )
}

/**
 * The better-sqlite3 handle under TypeORM, for bulk work that TypeORM's
 * per-row overhead would make too slow. TypeORM keeps one connection for
 * SQLite, so statements run on it join the transaction TypeORM has open.
 */
export function sqliteConnection(source: DataSource | EntityManager): Database.Database {
  const driver = 'driver' in source ? source.driver : source.dataSource.driver
  const connection: unknown = 'databaseConnection' in driver ? driver.databaseConnection : undefined
  if (driver.options.type !== 'better-sqlite3' || !isDatabase(connection)) {
    throw new Error('Bulk catalogue writes need the better-sqlite3 driver.')
  }
  return connection
}

/**
 * Runs `work` inside a TypeORM transaction on the raw connection. `work` is
 * synchronous on purpose: TypeORM shares that one connection with every
 * request, so letting the event loop turn while the transaction is open would
 * let other requests' statements slip into it.
 */
export async function inTransaction<T>(dataSource: DataSource, work: (db: Database.Database) => T): Promise<T> {
  return dataSource.transaction(async (manager) => {
    const db = sqliteConnection(manager)
    if (!db.inTransaction) throw new Error('Expected the TypeORM transaction to be open on the raw connection.')
    return work(db)
  })
}
