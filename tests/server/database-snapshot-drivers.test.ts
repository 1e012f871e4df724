import 'reflect-metadata'
import type { DataSource } from 'typeorm'
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { openDatabase, type DatabaseTarget } from '../../server/db/data-source'
import type { Database } from '../../server/db/database'
import { pairCondition } from '../../server/db/database'
import { databaseOf } from '../../server/db/sqlite-connection'
import { databaseDrivers, type OpenedDatabase } from '../helpers/database-drivers'

/** The same database as `dataSource`, through a connection of its own (another server, or the import worker). */
function targetOf(dataSource: DataSource): DatabaseTarget {
  const options = dataSource.options as { type: string; database?: string; url?: string }
  return options.type === 'postgres' ? { type: 'postgres', url: options.url! } : { type: 'sqlite', path: String(options.database) }
}

const countSettings = async (db: Database) =>
  (await db.get<{ n: number }>('SELECT CAST(COUNT(*) AS INTEGER) AS "n" FROM app_setting WHERE "key" LIKE \'snapshot-%\''))!.n

describe.each(databaseDrivers('snapshot'))('reading one moment and looking up pairs on $name', (driver) => {
  let opened: OpenedDatabase
  let other: DataSource
  let db: Database

  beforeAll(async () => {
    opened = await driver.open()
    db = databaseOf(opened.dataSource)
    other = await openDatabase(targetOf(opened.dataSource))
  })
  afterAll(async () => {
    await other?.destroy()
    await opened?.close()
  })

  it('keeps reading the moment a snapshot began while another connection commits', async () => {
    await db.run('INSERT INTO app_setting ("key", "value") VALUES (?, ?)', ['snapshot-a', '1'])
    const seen = await db.snapshot(async (tx) => {
      const before = await countSettings(tx)
      await databaseOf(other).run('INSERT INTO app_setting ("key", "value") VALUES (?, ?)', ['snapshot-b', '1'])
      return [before, await countSettings(tx)]
    })
    expect(seen).toEqual([1, 1])
    expect(await countSettings(db)).toBe(2)
  })

  it('finds the links holding any of a list of pairs, and no others', async () => {
    const part = (number: string) =>
      db.insert(
        'INSERT INTO part ("partNumber", "partKey", "kind", "name", "attributes") VALUES (?, ?, \'head\', ?, \'{}\') RETURNING "id"',
        [number, number, number],
      )
    const [a, b, c] = [await part('SNAP-A'), await part('SNAP-B'), await part('SNAP-C')]
    const link = (x: number, y: number) =>
      db.insert('INSERT INTO link ("partAId", "partBId", "relation", "source") VALUES (?, ?, \'fits\', \'editor\') RETURNING "id"', [x, y])
    const ab = await link(a, b)
    const bc = await link(b, c)
    await link(a, c)
    const found = await db.column(`SELECT l."id" FROM link l WHERE ${pairCondition('l', 3)} ORDER BY l."id"`, [a, b, b, c, c, a])
    expect(found).toEqual([ab, bc])
  })
})
