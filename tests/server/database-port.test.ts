import 'reflect-metadata'
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { PartRepository } from '../../server/catalogue/part.repository'
import type { Database } from '../../server/db/database'
import { numberPlaceholders } from '../../server/db/postgres-database'
import { databaseOf } from '../../server/db/sqlite-connection'
import { databaseDrivers, type DatabaseDriver } from '../helpers/database-drivers'

describe('numbering placeholders for PostgreSQL', () => {
  it.each([
    ['SELECT 1 WHERE a = ? AND b = ?', 'SELECT 1 WHERE a = $1 AND b = $2'],
    ['SELECT \'?\' AS q, "we?ird" FROM t WHERE x = ?', 'SELECT \'?\' AS q, "we?ird" FROM t WHERE x = $1'],
    ['INSERT INTO t (a) VALUES (?), (?), (?)', 'INSERT INTO t (a) VALUES ($1), ($2), ($3)'],
  ])('numbers %s', (sql, expected) => {
    expect(numberPlaceholders(sql)).toBe(expected)
  })
})

type Driver = DatabaseDriver

const drivers = databaseDrivers('port')

const insertPart = `INSERT INTO part ("partNumber", "partKey", "kind", "name", "family", "yearFrom", "yearTo", "notes", "attributes", "createdAt", "updatedAt")
  VALUES (?, ?, ?, ?, '', ?, NULL, '', ?, ?, ?) RETURNING "id"`

describe.each(drivers)('the data port on $name', (driver) => {
  let opened: Awaited<ReturnType<Driver['open']>>
  let db: Database

  beforeAll(async () => {
    opened = await driver.open()
    db = databaseOf(opened.dataSource)
  })
  afterAll(async () => opened.close())

  async function addPart(number: string, tx: Database = db) {
    const now = new Date('2026-03-04T05:06:07.089Z')
    return tx.insert(insertPart, [number, number.replace(/[^A-Z0-9]/g, ''), 'head', `Head ${number}`, 1998, '{"chamberCc":44.5}', now, now])
  }

  it('inserts with RETURNING and reads numbers, text and timestamps back the same on both drivers', async () => {
    const id = await addPart('PT-HD-0001')
    expect(typeof id).toBe('number')
    const row = await db.get<{ total: number }>('SELECT CAST(COUNT(*) AS INTEGER) AS "total" FROM part WHERE "id" = ?', [id])
    expect(row).toEqual({ total: 1 })
    const part = await db.get<{ yearFrom: number; createdAt: unknown }>('SELECT "yearFrom", "createdAt" FROM part WHERE "id" = ?', [id])
    expect(part?.yearFrom).toBe(1998)
    const { toIsoTime } = await import('../../server/db/database')
    expect(toIsoTime(part?.createdAt)).toBe('2026-03-04T05:06:07.089Z')
  })

  it('writes a transaction whole or not at all', async () => {
    await expect(
      db.transaction(async (tx) => {
        await addPart('PT-HD-0002', tx)
        await addPart('PT-HD-0002', tx) // the part number is unique: the second insert fails
      }),
    ).rejects.toThrow()
    expect(await db.get('SELECT "id" FROM part WHERE "partNumber" = ?', ['PT-HD-0002'])).toBeUndefined()

    await db.transaction(async (tx) => {
      await addPart('PT-HD-0003', tx)
      // A statement through the database itself from inside the transaction joins it (it sees the new row).
      expect(await db.get('SELECT "id" FROM part WHERE "partNumber" = ?', ['PT-HD-0003'])).toBeDefined()
    })
    expect(await db.get('SELECT "id" FROM part WHERE "partNumber" = ?', ['PT-HD-0003'])).toBeDefined()
  })

  it('keeps statements from outside an open transaction out of it', async () => {
    let release!: () => void
    const held = new Promise<void>((resolve) => (release = resolve))
    const transaction = db.transaction(async (tx) => {
      await addPart('PT-HD-0004', tx)
      await held
      throw new Error('rolled back on purpose')
    })
    // Started while the transaction is open; it must not be written by, or lost with, the rollback.
    const outside = addPart('PT-HD-0005')
    release()
    await expect(transaction).rejects.toThrow('rolled back on purpose')
    await outside
    const numbers = await db.all<{ partNumber: string }>(
      'SELECT "partNumber" FROM part WHERE "partNumber" IN (?, ?) ORDER BY "partNumber"',
      ['PT-HD-0004', 'PT-HD-0005'],
    )
    expect(numbers.map((row) => row.partNumber)).toEqual(['PT-HD-0005'])
  })

  it('finds parts by number, normalised key and mark through the part repository', async () => {
    const id = await addPart('PT-HD-0100')
    await db.run('INSERT INTO part_mark ("partId", "type", "value", "valueKey") VALUES (?, ?, ?, ?)', [id, 'casting', 'C-77/1', 'C771'])
    const parts = new PartRepository(db)
    expect((await parts.byNumber('PT-HD-0100'))?.attributes).toEqual({ chamberCc: 44.5 })
    expect((await parts.byKey('PTHD0100'))?.id).toBe(id)
    expect((await parts.byMarkKey('C771'))?.marks).toEqual([{ type: 'casting', value: 'C-77/1' }])
    expect((await parts.byIds([id, -1])).map((part) => part.partNumber)).toEqual(['PT-HD-0100'])
  })

  it('reads list prices as whole cents through the part repository, leaving out parts without one', async () => {
    const priced = await addPart('PT-HD-0200')
    await addPart('PT-HD-0201')
    await db.run('UPDATE part SET "listPriceCents" = ? WHERE "id" = ?', [12990, priced])
    const parts = new PartRepository(db)
    expect(await parts.listPrices(['PT-HD-0200', 'PT-HD-0201', 'PT-NONE'])).toEqual(new Map([['PT-HD-0200', 12990]]))
    expect((await parts.byNumber('PT-HD-0200'))?.listPriceCents).toBe(12990)
    expect((await parts.byNumber('PT-HD-0201'))?.listPriceCents).toBeNull()
  })
})
