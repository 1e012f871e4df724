import 'reflect-metadata'
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { databaseOf } from '../../server/db/sqlite-connection'
import { UserService } from '../../server/users/user.service'
import { databaseDrivers, type DatabaseDriver } from '../helpers/database-drivers'

const drivers = databaseDrivers('users')
const PASSWORD = 'torque-in-three-stages-7'

/** An administrator's changes to accounts, as one transaction through the data port on each database. */
describe.each(drivers)('changing users on $name', { timeout: 30_000 }, (driver: DatabaseDriver) => {
  let opened: Awaited<ReturnType<DatabaseDriver['open']>>
  let users: UserService

  beforeAll(async () => {
    opened = await driver.open()
    users = new UserService(opened.dataSource)
  })
  afterAll(async () => opened.close())

  it('renames, changes role, disables and enables, and refuses to lose the last administrator', async () => {
    const boss = await users.create({ email: 'boss@shop.test', name: 'Boss', role: 'admin', password: PASSWORD })
    const fitter = await users.create({ email: 'fitter@shop.test', name: 'Fitter', role: 'tech', password: PASSWORD })
    const acting = { userId: boss.id, email: boss.email }

    expect(await users.update(fitter.id, { name: 'Senior fitter', role: 'editor' }, acting)).toMatchObject({
      name: 'Senior fitter',
      role: 'editor',
    })
    const disabled = await users.update(fitter.id, { disabled: true }, acting)
    expect(disabled.disabled).toBe(true)
    expect(await users.findById(fitter.id)).toBeNull()
    expect((await users.update(fitter.id, { disabled: false }, acting)).disabled).toBe(false)

    await expect(users.update(boss.id, { role: 'tech' }, acting)).rejects.toMatchObject({ status: 409 })
    await expect(users.update(999, { name: 'Nobody' }, acting)).rejects.toMatchObject({ status: 404 })
    await expect(users.update(fitter.id, { homeSiteId: 999 }, acting)).rejects.toMatchObject({ status: 400 })
    expect((await users.findById(boss.id))?.role).toBe('admin')
  })

  it('sets a new password that signs in, and retires the links still out for the user', async () => {
    const boss = (await users.list()).find((user) => user.role === 'admin')!
    const fitter = (await users.list()).find((user) => user.email === 'fitter@shop.test')!
    const db = databaseOf(opened.dataSource)
    await db.run('INSERT INTO account_token ("tokenHash", "userId", "purpose", "expiresAt", "createdAt") VALUES (?, ?, ?, ?, ?)', [
      'hash-of-a-reset-link',
      fitter.id,
      'reset',
      new Date(Date.now() + 3_600_000),
      new Date(),
    ])
    await users.update(fitter.id, { password: 'new-gasket-on-a-clean-deck-9' }, { userId: boss.id })
    expect(await users.verifyCredentials('fitter@shop.test', 'new-gasket-on-a-clean-deck-9')).toMatchObject({ id: fitter.id })
    const token = await db.get<{ usedAt: unknown }>('SELECT "usedAt" FROM account_token WHERE "tokenHash" = ?', ['hash-of-a-reset-link'])
    expect(token?.usedAt).not.toBeNull()
  })
})
