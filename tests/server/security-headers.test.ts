import request from 'supertest'
import { afterEach, describe, expect, it } from 'vitest'
import { loadConfig } from '../../server/config/env'
import { DEMO_PASSWORD } from '../../server/demo/seed'
import { createTestApp, type TestApp } from '../helpers/test-app'

let t: TestApp | undefined
afterEach(async () => {
  await t?.close()
  t = undefined
})

describe('security headers', () => {
  it('sends a CSP without inline scripts, nosniff, frame-ancestors none and a referrer policy', async () => {
    const app = (t = await createTestApp())
    const agent = await app.signIn('counter')
    const response = await agent.get('/api/health')
    const csp = response.headers['content-security-policy'] as string
    expect(csp).toContain("script-src 'self'")
    expect(csp).not.toMatch(/script-src[^;]*unsafe-inline/)
    expect(csp).toContain("frame-ancestors 'none'")
    expect(csp).toContain("font-src 'self'")
    expect(response.headers['x-content-type-options']).toBe('nosniff')
    expect(response.headers['referrer-policy']).toBe('same-origin')
    expect(response.headers['x-powered-by']).toBeUndefined()
  })

  it('sends HSTS only when the request came over HTTPS through a trusted proxy', async () => {
    const app = (t = await createTestApp())
    const agent = await app.signIn('counter')
    expect((await agent.get('/api/health')).headers['strict-transport-security']).toBeUndefined()
    const overHttps = await agent.get('/api/health').set('X-Forwarded-Proto', 'https')
    expect(overHttps.headers['strict-transport-security']).toMatch(/max-age=\d+/)
  })

  it('ignores X-Forwarded-Proto from a proxy that is not trusted', async () => {
    const app = (t = await createTestApp({ env: { FITWRIGHT_TRUST_PROXY: 'false' } }))
    const agent = await app.signIn('counter')
    const response = await agent.get('/api/health').set('X-Forwarded-Proto', 'https')
    expect(response.headers['strict-transport-security']).toBeUndefined()
  })

  it('marks the session cookie Secure when FITWRIGHT_COOKIE_SECURE=1 and the request came over HTTPS', async () => {
    const app = (t = await createTestApp({ env: { FITWRIGHT_COOKIE_SECURE: '1' } }))
    // The test client never returns a Secure cookie over plain http, so the session cookie is sent by hand.
    const login = async (proto: string) => {
      const csrf = await request(app.app).get('/api/auth/csrf').set('X-Forwarded-Proto', proto)
      const sid = ([] as string[]).concat(csrf.headers['set-cookie'] ?? []).find((c) => c.startsWith('fitwright.sid='))
      return request(app.app)
        .post('/api/auth/login')
        .set('X-Forwarded-Proto', proto)
        .set('Cookie', sid?.split(';')[0] ?? '')
        .set('x-csrf-token', (csrf.body as { token: string }).token)
        .send({ email: 'counter@fitwright.test', password: DEMO_PASSWORD })
    }
    const overHttps = await login('https')
    expect(overHttps.status).toBe(200)
    const sessionCookie = (r: Awaited<ReturnType<typeof login>>) =>
      ([] as string[]).concat(r.headers['set-cookie'] ?? []).find((c) => c.startsWith('fitwright.sid='))
    expect(sessionCookie(overHttps)).toMatch(/;\s*Secure/i)
    expect(sessionCookie(await login('http'))).toBeUndefined()
  })
})

describe('loadConfig, cookies and proxies', () => {
  it('makes cookies Secure in production unless FITWRIGHT_COOKIE_SECURE says otherwise', () => {
    expect(loadConfig({ NODE_ENV: 'production' }).cookieSecure).toBe(true)
    expect(loadConfig({ NODE_ENV: 'production', FITWRIGHT_COOKIE_SECURE: '0' }).cookieSecure).toBe(false)
    expect(loadConfig({ NODE_ENV: 'production', FITWRIGHT_COOKIE_SECURE: 'auto' }).cookieSecure).toBe('auto')
    expect(loadConfig({ NODE_ENV: 'development' }).cookieSecure).toBe('auto')
  })

  it('reads FITWRIGHT_TRUST_PROXY as a hop count, a flag or addresses, loopback by default', () => {
    expect(loadConfig({}).trustProxy).toBe('loopback')
    expect(loadConfig({ FITWRIGHT_TRUST_PROXY: '2' }).trustProxy).toBe(2)
    expect(loadConfig({ FITWRIGHT_TRUST_PROXY: 'false' }).trustProxy).toBe(false)
    expect(loadConfig({ FITWRIGHT_TRUST_PROXY: '10.0.0.0/8, 127.0.0.1' }).trustProxy).toBe('10.0.0.0/8, 127.0.0.1')
    expect(() => loadConfig({ FITWRIGHT_TRUST_PROXY: 'a;b' })).toThrow(/FITWRIGHT_TRUST_PROXY/)
    expect(() => loadConfig({ FITWRIGHT_COOKIE_SECURE: 'maybe' })).toThrow(/FITWRIGHT_COOKIE_SECURE/)
  })
})
