import 'reflect-metadata'
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { AccountTokenRepository } from '../../server/auth/account-token.repository'
import { toIsoTime } from '../../server/db/database'
import { databaseOf } from '../../server/db/sqlite-connection'
import { SharedLinkRepository } from '../../server/shared-links/shared-link.repository'
import { databaseDrivers, type DatabaseDriver } from '../helpers/database-drivers'

type Driver = DatabaseDriver

const drivers = databaseDrivers('shared')

/** The shared_link table through its migration and the data port, on each driver. */
describe.each(drivers)('shared links on $name', { timeout: 30_000 }, (driver) => {
  let opened: Awaited<ReturnType<Driver['open']>>
  beforeAll(async () => {
    opened = await driver.open()
  })
  afterAll(async () => opened.close())

  it('stores a link by its hash and finds it again with its expiry and who shared it; a second link with the same hash is refused', async () => {
    const db = databaseOf(opened.dataSource)
    const links = new SharedLinkRepository(db)
    const now = new Date('2026-03-01T10:00:00.000Z')
    const expiresAt = new Date('2026-03-08T10:00:00.000Z')
    const link = { kind: 'quote' as const, targetId: 42, tokenHash: 'a'.repeat(64), expiresAt, recipient: 'walk-in@example.test' }
    await db.transaction(async (tx) => {
      const sharedById = await new AccountTokenRepository(db).insertInvitedUser(
        tx,
        { email: 'counter@shop.test', name: 'Counter Clerk', role: 'counter' },
        now,
      )
      await links.insert(tx, { ...link, sharedById }, now)
    })

    const found = await links.findByHash('a'.repeat(64))
    expect(found).toMatchObject({ kind: 'quote', targetId: 42, sharedBy: 'Counter Clerk' })
    expect(toIsoTime(found!.expiresAt)).toBe('2026-03-08T10:00:00.000Z')
    expect(await links.findByHash('b'.repeat(64))).toBeUndefined()
    await expect(db.transaction((tx) => links.insert(tx, { ...link, sharedById: 1 }, now))).rejects.toThrow()
  })
})
