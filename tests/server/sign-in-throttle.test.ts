import { describe, expect, it } from 'vitest'
import { createApp } from '../../server/app'
import { prepareDatabase } from '../../server/bootstrap'
import { DEMO_PASSWORD } from '../../server/demo/seed'
import { anonymous, createTestApp } from '../helpers/test-app'

describe('sign-in throttling per address', () => {
  it('throttles one address that tries 60 different accounts, after the per-address limit (30 by default)', async () => {
    const own = await createTestApp()
    const statuses: number[] = []
    for (let i = 0; i < 60; i++) {
      const response = await (
        await anonymous(own.app)
      )
        .post('/api/auth/login')
        .send({ email: `nobody.${i}@shop.test`, password: 'guess-guess' })
      statuses.push(response.status)
    }
    expect(statuses.slice(0, 30).every((status) => status === 401)).toBe(true)
    expect(statuses.slice(30).every((status) => status === 429)).toBe(true)
    // The whole address waits, even with a right password for a real account.
    const blocked = await (await anonymous(own.app)).post('/api/auth/login').send({ email: 'tech@fitwright.test', password: DEMO_PASSWORD })
    expect(blocked.status).toBe(429)
    expect(Number(blocked.headers['retry-after'])).toBeGreaterThan(14 * 60)
    expect(Number(blocked.headers['retry-after'])).toBeLessThanOrEqual(15 * 60)
    expect(blocked.body.error.message).toMatch(/from this address\. Try again in 15 minutes \(at \d\d:\d\d UTC\)/)
    await own.close()
  }, 60_000)
})

describe('sign-in throttling per account', () => {
  it('keeps the failures in the database, so a new app on the same database still refuses the account', async () => {
    const own = await createTestApp({ env: { FITWRIGHT_LOGIN_ATTEMPTS: '3' } })
    for (let i = 0; i < 3; i++) {
      const response = await (
        await anonymous(own.app)
      )
        .post('/api/auth/login')
        .send({ email: 'counter@fitwright.test', password: 'guess-guess' })
      expect(response.status).toBe(401)
    }
    const restarted = await prepareDatabase(own.config)
    const app = await createApp({ config: own.config, dataSource: restarted.dataSource, services: restarted.services, version: 'test' })
    const blocked = await (await anonymous(app)).post('/api/auth/login').send({ email: 'counter@fitwright.test', password: DEMO_PASSWORD })
    expect(blocked.status).toBe(429)
    expect(blocked.headers['retry-after']).toMatch(/^\d+$/)
    expect(blocked.body.error.message).toContain('for this account')
    await restarted.dataSource.destroy()
    await own.close()
  })

  it('forgets an account failures once it signs in', async () => {
    const own = await createTestApp({ env: { FITWRIGHT_LOGIN_ATTEMPTS: '3' } })
    const attempt = async (password: string) =>
      (await anonymous(own.app)).post('/api/auth/login').send({ email: 'editor@fitwright.test', password })
    for (let i = 0; i < 2; i++) expect((await attempt('guess-guess')).status).toBe(401)
    expect((await attempt(DEMO_PASSWORD)).status).toBe(200)
    for (let i = 0; i < 2; i++) expect((await attempt('guess-guess')).status).toBe(401)
    expect((await attempt(DEMO_PASSWORD)).status).toBe(200)
    await own.close()
  })
})
