import type { DataSource } from 'typeorm'
import type { ImportType } from '../../shared/schemas/imports'
import type { TestApp } from './test-app'

type Agent = Awaited<ReturnType<TestApp['signIn']>>

export type UploadOptions = {
  type: ImportType
  mode?: 'preview' | 'commit'
  validRowsOnly?: boolean
  name?: string
  progress?: boolean
}

/** Sends a CSV (text or raw bytes) to POST /api/imports as the form the client sends. */
export function uploadCsv(agent: Agent, content: string | Buffer, options: UploadOptions) {
  let request = agent.post('/api/imports')
  if (options.progress) request = request.set('Accept', 'application/x-ndjson')
  request = request.field('type', options.type).field('mode', options.mode ?? 'preview')
  if (options.validRowsOnly) request = request.field('validRowsOnly', 'true')
  const bytes = typeof content === 'string' ? Buffer.from(content, 'utf8') : content
  return request.attach('file', bytes, { filename: options.name ?? `${options.type}.csv`, contentType: 'text/csv' })
}

const CATALOGUE_TABLES = ['part', 'part_mark', 'link', 'link_modification', 'part_identity', 'modification'] as const

/**
 * Every row of the catalogue tables, every column included (ids, timestamps,
 * batch ids), so "nothing changed" and "restored exactly" can be asserted.
 */
export async function catalogueSnapshot(dataSource: DataSource, tables: readonly string[] = CATALOGUE_TABLES) {
  const snapshot: Record<string, unknown[]> = {}
  // By the first columns: the id, or for link_modification its two-column key (its rowid means nothing).
  for (const table of tables) snapshot[table] = await dataSource.query(`SELECT * FROM "${table}" ORDER BY 1, 2`)
  return snapshot
}

/** The catalogue plus the import history: what "the database is unchanged" compares. */
export function databaseSnapshot(dataSource: DataSource) {
  return catalogueSnapshot(dataSource, [...CATALOGUE_TABLES, 'import_batch', 'import_change'])
}
