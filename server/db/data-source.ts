import { DataSource } from 'typeorm'
import { entities } from './entities'
import { migrations as sqliteMigrations, postgresMigrations } from './migrations'

/** Where the catalogue lives: the embedded SQLite file, or a PostgreSQL database shared by several servers. */
export type DatabaseTarget = { type: 'sqlite'; path: string } | { type: 'postgres'; url: string }

/**
 * The schema comes from migrations only (one list per driver, from the same
 * entities). SQLite runs in WAL, so readers go on while an import writes.
 */
export function createDataSource(target: DatabaseTarget): DataSource {
  if (target.type === 'postgres') {
    return new DataSource({
      type: 'postgres',
      url: target.url,
      entities,
      migrations: postgresMigrations,
      synchronize: false,
      // UTC sessions, so column defaults (now()) and the Dates the server writes agree.
      extra: { max: 10, options: '-c timezone=UTC' },
    })
  }
  return new DataSource({
    type: 'better-sqlite3',
    database: target.path,
    entities,
    migrations: sqliteMigrations,
    synchronize: false,
    enableWAL: target.path !== ':memory:',
    prepareDatabase: (db: { pragma: (sql: string) => unknown }) => {
      db.pragma('synchronous = NORMAL')
    },
  })
}

export async function openDatabase(target: DatabaseTarget | string): Promise<DataSource> {
  const dataSource = createDataSource(typeof target === 'string' ? { type: 'sqlite', path: target } : target)
  await dataSource.initialize()
  await dataSource.runMigrations({ transaction: 'each' })
  return dataSource
}
