import { describe, expect, it } from 'vitest'
import { loadConfig } from '../../server/config/env'
import { anonymous, createTestApp } from '../helpers/test-app'

describe('loadConfig', () => {
  it('uses the documented defaults', () => {
    const config = loadConfig({})
    expect(config).toMatchObject({ port: 3000, dbPath: 'data/fitwright.sqlite', demo: true })
  })

  it('turns the demo scenario off with FITWRIGHT_DEMO=0', () => {
    expect(loadConfig({ FITWRIGHT_DEMO: '0' }).demo).toBe(false)
  })

  it('stops with the variable named when a value is invalid', () => {
    expect(() => loadConfig({ PORT: 'eighty' })).toThrow(/PORT/)
    expect(() => loadConfig({ FITWRIGHT_DEMO: 'maybe' })).toThrow(/FITWRIGHT_DEMO/)
  })
})

describe('first administrator without the demo', () => {
  it('creates the administrator from the environment when the database has no users', async () => {
    const t = await createTestApp({
      demo: false,
      env: { FITWRIGHT_ADMIN_EMAIL: 'boss@shop.test', FITWRIGHT_ADMIN_PASSWORD: 'first-admin-pass' },
    })
    const login = await (await anonymous(t.app)).post('/api/auth/login').send({ email: 'boss@shop.test', password: 'first-admin-pass' })
    expect(login.body.role).toBe('admin')
    const demo = await (await anonymous(t.app)).post('/api/auth/login').send({ email: 'admin@fitwright.test', password: 'fitwright-demo' })
    expect(demo.status).toBe(401)
    const parts = await t.dataSource.query('SELECT COUNT(*) AS n FROM part')
    expect(parts[0].n).toBe(0)
    await t.close()
  })
})
