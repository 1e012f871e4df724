import 'reflect-metadata'
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { PartSearchRepository } from '../../server/catalogue/part-search.repository'
import type { Database } from '../../server/db/database'
import { databaseOf } from '../../server/db/sqlite-connection'
import { databaseDrivers, type OpenedDatabase } from '../helpers/database-drivers'

const insertPart = `INSERT INTO part ("partNumber", "partKey", "kind", "name", "family", "yearFrom", "yearTo", "notes", "attributes", "createdAt", "updatedAt")
  VALUES (?, ?, 'head', ?, 'TK2', NULL, NULL, '', '{}', ?, ?) RETURNING "id"`

/** The search's three tiers of ids, on each driver: the SQL is written once for both. */
describe.each(databaseDrivers('part-search'))('part search tiers on $name', { timeout: 30_000 }, (driver) => {
  let opened: OpenedDatabase
  let db: Database
  const ids: Record<string, number> = {}

  beforeAll(async () => {
    opened = await driver.open()
    db = databaseOf(opened.dataSource)
    const now = new Date()
    const parts: [string, string, string[]][] = [
      ['PS-HD-100', 'Uprated head', ['uprated', 'head', 'tk2']],
      ['PS-HD-1001', 'Economy head', ['economy', 'head', 'tk2']],
      ['PS-HD-200', 'Uprated exporter head', ['uprated', 'exporter', 'head', 'tk2']],
    ]
    for (const [number, name, words] of parts) {
      const id = await db.insert(insertPart, [number, number.replace(/-/g, ''), name, now, now])
      ids[number] = id
      for (const word of words) await db.run('INSERT INTO part_word ("partId", "word") VALUES (?, ?)', [id, word])
    }
    await db.run('INSERT INTO part_mark ("partId", "type", "value", "valueKey") VALUES (?, ?, ?, ?)', [
      ids['PS-HD-200']!,
      'casting',
      'PSHD100',
      'PSHD100',
    ])
  })
  afterAll(async () => opened.close())

  it('answers the exact number or mark, then the numbers and marks it starts, then the parts whose words it starts', async () => {
    const tiers = await new PartSearchRepository(db).tiers({ key: 'PSHD100', words: ['pshd100'] })
    expect(tiers.map((tier) => [...tier].sort((a, b) => a - b))).toEqual([
      [ids['PS-HD-100'], ids['PS-HD-200']].sort((a, b) => a! - b!),
      [ids['PS-HD-100'], ids['PS-HD-1001'], ids['PS-HD-200']].sort((a, b) => a! - b!),
      [],
    ])
  })

  it('needs every query word to start some word of the part', async () => {
    const [both] = await new PartSearchRepository(db).tiers({ key: '', words: ['upr', 'export'] })
    const [one] = await new PartSearchRepository(db).tiers({ key: '', words: ['uprated'] })
    expect(both).toEqual([ids['PS-HD-200']])
    expect([...one!].sort((a, b) => a - b)).toEqual([ids['PS-HD-100'], ids['PS-HD-200']].sort((a, b) => a! - b!))
  })

  it('reads a column of values without an object per row', async () => {
    const numbers = await db.column<string>('SELECT "partNumber" FROM part WHERE "partNumber" LIKE ? ORDER BY "partNumber"', ['PS-%'])
    expect(numbers).toEqual(['PS-HD-100', 'PS-HD-1001', 'PS-HD-200'])
  })
})
