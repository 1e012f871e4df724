import { tmpdir } from 'node:os'
import path from 'node:path'
import 'reflect-metadata'
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { AccountService } from '../../server/auth/account.service'
import { AccountTokenRepository } from '../../server/auth/account-token.repository'
import { ResetThrottle } from '../../server/auth/reset-throttle'
import { SessionRepository } from '../../server/auth/session.repository'
import { SignInThrottleRepository } from '../../server/auth/sign-in-throttle.repository'
import { databaseOf } from '../../server/db/sqlite-connection'
import { Mailer } from '../../server/mail/mailer'
import { OutboxRepository } from '../../server/mail/outbox.repository'
import { OutboxService } from '../../server/mail/outbox.service'
import { SecurityEventService } from '../../server/security/security-events.service'
import { UserService } from '../../server/users/user.service'
import { databaseDrivers, type DatabaseDriver } from '../helpers/database-drivers'

type Driver = DatabaseDriver

const drivers = databaseDrivers('tokens')

const PASSWORD = 'torque-in-three-stages-7'
const ADMIN = { userId: 1, email: 'boss@shop.test', name: 'Shop Boss', address: '127.0.0.1' }

/** The accounts service on one driver, with the outbox read straight from its table (nothing is delivered here). */
describe.each(drivers)('one-time password links on $name', { timeout: 30_000 }, (driver) => {
  let opened: Awaited<ReturnType<Driver['open']>>
  let accounts: AccountService
  let outbox: OutboxRepository

  beforeAll(async () => {
    opened = await driver.open()
    const db = databaseOf(opened.dataSource)
    outbox = new OutboxRepository(db)
    const throttles = new SignInThrottleRepository(db)
    accounts = new AccountService(db, new AccountTokenRepository(db), {
      users: new UserService(opened.dataSource),
      outbox: new OutboxService(outbox, new Mailer({ mailDir: path.join(tmpdir(), 'unused'), from: 'x <x@x.test>' })),
      sessions: new SessionRepository(db),
      events: new SecurityEventService(opened.dataSource),
      resetThrottle: new ResetThrottle(throttles, { perEmail: 3, perAddress: 20 }),
      publicUrl: 'http://fitwright.test',
    })
  })
  afterAll(async () => opened.close())

  /** The token in the newest queued message to `email`. */
  async function lastToken(email: string): Promise<string> {
    const { rows } = await outbox.page(0, 50)
    const text = rows.find((row) => row.recipient === email)?.text ?? ''
    return /#token=([\w-]+)/.exec(text)?.[1] ?? ''
  }

  it('invites, sets the password from the link exactly once, and then signs in with it', async () => {
    const user = await accounts.invite({ email: 'fitter@shop.test', name: 'Fitter', role: 'tech' }, ADMIN)
    expect(user.invitePending).toBe(true)
    const token = await lastToken('fitter@shop.test')
    expect(await accounts.linkInfo(token)).toEqual({ purpose: 'invite', email: 'fitter@shop.test', name: 'Fitter' })
    const [first, second] = await Promise.allSettled([
      accounts.setPasswordFromLink(token, PASSWORD, '127.0.0.1'),
      accounts.setPasswordFromLink(token, 'a-different-one-55', '127.0.0.1'),
    ])
    // Two requests racing with the same link: one sets the password, the other is refused.
    expect([first.status, second.status].sort()).toEqual(['fulfilled', 'rejected'])
    const users = new UserService(opened.dataSource)
    const winner = first.status === 'fulfilled' ? PASSWORD : 'a-different-one-55'
    expect((await users.verifyCredentials('fitter@shop.test', winner))?.email).toBe('fitter@shop.test')
    await expect(accounts.linkInfo(token)).rejects.toMatchObject({ code: 'link_unusable' })
  })

  it('answers a reset request for an unknown address without queueing anything, and refuses an expired link', async () => {
    await accounts.forgotPassword('nobody@shop.test', '127.0.0.2')
    await accounts.resetsQueued()
    expect(await lastToken('nobody@shop.test')).toBe('')
    await accounts.forgotPassword('fitter@shop.test', '127.0.0.2')
    await accounts.resetsQueued()
    const token = await lastToken('fitter@shop.test')
    expect((await accounts.linkInfo(token)).purpose).toBe('reset')
    await databaseOf(opened.dataSource).run('UPDATE "account_token" SET "expiresAt" = ? WHERE "purpose" = ?', [
      new Date(Date.now() - 1000),
      'reset',
    ])
    await expect(accounts.setPasswordFromLink(token, PASSWORD, '127.0.0.2')).rejects.toMatchObject({ code: 'link_unusable' })
  })
})
