import type { DataSource, EntityMetadata } from 'typeorm'
import { chunks, placeholders, toIsoTime, type Database, type SqlValue } from './database'
import { databaseOf } from './sqlite-connection'

/** PostgreSQL takes at most 65,535 parameters in one statement. */
const MAX_PARAMETERS = 60_000

/** Tables so that each comes after the tables its foreign keys point to. */
function inReferenceOrder(metadatas: readonly EntityMetadata[]): EntityMetadata[] {
  const ordered: EntityMetadata[] = []
  const placed = new Set<string>()
  const visit = (metadata: EntityMetadata, path: Set<string>) => {
    if (placed.has(metadata.tableName) || path.has(metadata.tableName)) return
    path.add(metadata.tableName)
    for (const key of metadata.foreignKeys) visit(key.referencedEntityMetadata, path)
    placed.add(metadata.tableName)
    ordered.push(metadata)
  }
  for (const metadata of metadatas) visit(metadata, new Set())
  return ordered
}

type Convert = (value: unknown) => SqlValue

/** SQLite keeps booleans as 0/1 and times as UTC text; PostgreSQL wants them typed. */
function converter(target: DataSource, metadata: EntityMetadata, name: string): Convert {
  const column = metadata.columns.find((candidate) => candidate.databaseName === name)
  const type = column ? String(target.driver.normalizeType(column)) : ''
  if (type === 'boolean') return (value) => (value === null || value === undefined ? null : Boolean(value))
  if (type.startsWith('timestamp')) return (value) => (value === null || value === undefined ? null : new Date(toIsoTime(value)))
  return (value) => (value === undefined ? null : (value as SqlValue))
}

async function copyTable(source: Database, target: Database, targetSource: DataSource, metadata: EntityMetadata) {
  const names = metadata.columns.map((column) => column.databaseName)
  const converts = names.map((name) => converter(targetSource, metadata, name))
  const quoted = names.map((name) => `"${name}"`).join(', ')
  const order = metadata.primaryColumns.map((column) => `"${column.databaseName}"`).join(', ')
  const rows = await source.all(`SELECT ${quoted} FROM "${metadata.tableName}"${order ? ` ORDER BY ${order}` : ''}`)
  const perStatement = Math.max(1, Math.floor(MAX_PARAMETERS / names.length))
  for (const slice of chunks(rows, perStatement)) {
    const values = slice.map(() => `(${placeholders(names.length)})`).join(', ')
    const params = slice.flatMap((row) => names.map((name, index) => converts[index]!(row[name])))
    await target.run(`INSERT INTO "${metadata.tableName}" (${quoted}) VALUES ${values}`, params)
  }
  for (const column of metadata.primaryColumns.filter((primary) => primary.generationStrategy === 'increment')) {
    const table = metadata.tableName
    await target.run(
      `SELECT setval(pg_get_serial_sequence('"${table}"', '${column.databaseName}'), COALESCE(MAX("${column.databaseName}"), 1), MAX("${column.databaseName}") IS NOT NULL) FROM "${table}"`,
    )
  }
}

/**
 * Copies every table of an embedded SQLite database into a migrated
 * PostgreSQL database of the same schema, replacing what the target's tables
 * hold, in one transaction: all of it lands, or none. Ids are kept, and each
 * id sequence continues after the highest copied id.
 */
export async function copyTables(from: DataSource, to: DataSource): Promise<void> {
  if (from.options.type !== 'better-sqlite3' || to.options.type !== 'postgres') {
    throw new Error('Tables are copied from SQLite into PostgreSQL only.')
  }
  const tables = inReferenceOrder(to.entityMetadatas)
  const source = databaseOf(from)
  await databaseOf(to).transaction(async (target) => {
    for (const metadata of [...tables].reverse()) await target.run(`DELETE FROM "${metadata.tableName}"`)
    for (const metadata of tables) await copyTable(source, target, to, metadata)
  })
}
