import { DataSource } from 'typeorm'
import { entities } from './entities'
import { migrations } from './migrations'

/**
 * SQLite through better-sqlite3. The schema comes from migrations only; WAL lets
 * readers go on while an import writes.
 */
export function createDataSource(databasePath: string): DataSource {
  return new DataSource({
    type: 'better-sqlite3',
    database: databasePath,
    entities,
    migrations,
    synchronize: false,
    enableWAL: databasePath !== ':memory:',
    prepareDatabase: (db: { pragma: (sql: string) => unknown }) => {
      db.pragma('synchronous = NORMAL')
      db.pragma('busy_timeout = 5000')
    },
  })
}

export async function openDatabase(databasePath: string): Promise<DataSource> {
  const dataSource = createDataSource(databasePath)
  await dataSource.initialize()
  await dataSource.runMigrations({ transaction: 'each' })
  return dataSource
}
