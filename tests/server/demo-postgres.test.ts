import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { databaseOf } from '../../server/db/sqlite-connection'
import { postgresServerUrl } from '../helpers/postgres'
import { createTestApp, type TestApp } from '../helpers/test-app'

/** Rows per table, for every table the entities map. */
async function rowCounts(t: TestApp): Promise<Record<string, number>> {
  const counts: Record<string, number> = {}
  for (const { tableName } of t.dataSource.entityMetadatas) {
    const row = await databaseOf(t.dataSource).get<{ n: number }>(`SELECT CAST(COUNT(*) AS INTEGER) AS "n" FROM "${tableName}"`)
    counts[tableName] = row!.n
  }
  return counts
}

describe.skipIf(!postgresServerUrl)('the demo scenario on PostgreSQL', () => {
  let onSqlite: TestApp
  let onPostgres: TestApp
  beforeAll(async () => {
    onSqlite = await createTestApp({ postgres: false })
    onPostgres = await createTestApp({ postgres: true })
  })
  afterAll(async () => {
    await onPostgres?.close()
    await onSqlite?.close()
  })

  it('holds every row the embedded demo holds, table by table', async () => {
    const expected = await rowCounts(onSqlite)
    expect(expected.part).toBeGreaterThan(0)
    expect(await rowCounts(onPostgres)).toEqual(expected)
  })

  it('keeps the demo’s times and flags as the SQLite demo has them', async () => {
    const sql = 'SELECT "fileName", "createdAt", "validRowsOnly" FROM import_batch ORDER BY "id"'
    const read = async (t: TestApp) =>
      (await databaseOf(t.dataSource).all<{ fileName: string; createdAt: unknown; validRowsOnly: unknown }>(sql)).map((row) => ({
        fileName: row.fileName,
        day: new Date(row.createdAt instanceof Date ? row.createdAt : `${String(row.createdAt).replace(' ', 'T')}Z`)
          .toISOString()
          .slice(0, 10),
        validRowsOnly: Boolean(row.validRowsOnly),
      }))
    expect(await read(onPostgres)).toEqual(await read(onSqlite))
  })

  it('gives the next record the next id', async () => {
    const editor = await onPostgres.signIn('editor')
    const created = await editor.post('/api/links').send({ fromPart: 'TM-IM-2000T', toPart: 'TM-HD-2050', relation: 'fits' })
    expect(created.status, JSON.stringify(created.body)).toBe(201)
    const highest = await databaseOf(onPostgres.dataSource).get<{ id: number }>('SELECT MAX("id") AS "id" FROM link')
    expect(created.body.id).toBe(highest!.id)
  })
})
