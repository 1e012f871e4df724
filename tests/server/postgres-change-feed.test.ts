import 'reflect-metadata'
import type { DataSource } from 'typeorm'
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import type { Database } from '../../server/db/database'
import { openDatabase } from '../../server/db/data-source'
import { listenForCatalogueChanges, pruneCatalogueChanges, type TouchedIds } from '../../server/db/postgres-change-listener'
import pg from 'pg'
import { databaseOf } from '../../server/db/sqlite-connection'
import { createPostgresDatabase, postgresServerUrl } from '../helpers/postgres'

/** Resolves with the first batch of changes that satisfies `match`, or rejects after `ms`. */
function nextChange(received: TouchedIds[], match: (touched: TouchedIds) => boolean, ms = 3000): Promise<TouchedIds> {
  return new Promise((resolve, reject) => {
    const started = Date.now()
    const look = () => {
      const found = received.find(match)
      if (found) return resolve(found)
      if (Date.now() - started > ms) return reject(new Error(`No matching change within ${ms} ms; got ${JSON.stringify(received)}`))
      setTimeout(look, 20)
    }
    look()
  })
}

describe.skipIf(!postgresServerUrl)('the catalogue change feed between two servers on one PostgreSQL database', () => {
  let database: Awaited<ReturnType<typeof createPostgresDatabase>>
  let writer: DataSource
  let db: Database
  const received: TouchedIds[] = []
  let listener: Awaited<ReturnType<typeof listenForCatalogueChanges>>

  beforeAll(async () => {
    database = await createPostgresDatabase()
    writer = await openDatabase({ type: 'postgres', url: database.url })
    db = databaseOf(writer)
    listener = await listenForCatalogueChanges(database.url, async (touched) => {
      received.push(touched)
    })
  })
  afterAll(async () => {
    await listener?.close()
    await writer?.destroy()
    await database?.drop()
  })

  const addPart = (number: string) =>
    db.insert(`INSERT INTO part ("partNumber", "partKey", "kind", "name", "attributes") VALUES (?, ?, 'head', ?, '{}') RETURNING "id"`, [
      number,
      number.replace(/-/g, ''),
      number,
    ])

  it('hands the other server the ids of parts and links written, changed and removed, within a second', async () => {
    const a = await addPart('CF-HD-0001')
    const b = await addPart('CF-BL-0001')
    expect(await nextChange(received, (t) => (t.parts ?? []).includes(b), 1000)).toBeDefined()

    const link = await db.insert(
      `INSERT INTO link ("partAId", "partBId", "relation", "source") VALUES (?, ?, 'fits', 'editor') RETURNING "id"`,
      [a, b],
    )
    await nextChange(received, (t) => (t.links ?? []).includes(link), 1000)

    received.length = 0
    await db.run(`UPDATE link SET "relation" = 'does-not-fit' WHERE "id" = ?`, [link])
    await nextChange(received, (t) => (t.links ?? []).includes(link), 1000)

    received.length = 0
    await db.run('DELETE FROM part WHERE "id" = ?', [a]) // cascades to the link
    const removal = await nextChange(received, (t) => (t.links ?? []).includes(link) && !(t.parts ?? []).includes(b), 1000)
    expect(removal).toBeDefined()
  })

  it('tells nothing about a transaction that was rolled back', async () => {
    received.length = 0
    await expect(
      db.transaction(async (tx) => {
        await tx.insert(
          `INSERT INTO part ("partNumber", "partKey", "kind", "name", "attributes") VALUES ('CF-HD-0009', 'CFHD0009', 'head', 'x', '{}') RETURNING "id"`,
        )
        throw new Error('rolled back on purpose')
      }),
    ).rejects.toThrow('rolled back on purpose')
    const id = await addPart('CF-HD-0010')
    const change = await nextChange(received, (t) => (t.parts ?? []).includes(id), 1000)
    expect(received.flatMap((t) => t.parts ?? [])).toEqual([id])
    expect(change.parts).toEqual([id])
  })

  it('removes changes a day old, keeping the newer ones', async () => {
    const old = await db.insert(`INSERT INTO catalogue_change ("touched", "createdAt") VALUES ('{"parts": [1]}', ?) RETURNING "id"`, [
      new Date(Date.now() - 25 * 60 * 60_000),
    ])
    const fresh = await db.insert(`INSERT INTO catalogue_change ("touched") VALUES ('{"parts": [2]}') RETURNING "id"`)
    const client = new pg.Client({ connectionString: database.url })
    await client.connect()
    try {
      expect(await pruneCatalogueChanges(client)).toBeGreaterThanOrEqual(1)
    } finally {
      await client.end()
    }
    const left = await db.column('SELECT "id" FROM catalogue_change WHERE "id" IN (?, ?)', [old, fresh])
    expect(left).toEqual([fresh])
  })
})
