import request from 'supertest'
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { DEMO_PASSWORD } from '../../server/demo/seed'
import { anonymous, withCsrf, createTestApp, type TestApp } from '../helpers/test-app'

let t: TestApp
beforeAll(async () => {
  t = await createTestApp()
})
afterAll(() => t.close())

describe('GET /api/health', () => {
  it('answers ok and the version without a session', async () => {
    const response = await request(t.app).get('/api/health')
    expect(response.status).toBe(200)
    expect(response.body).toEqual({ ok: true, version: 'test' })
  })
})

describe('POST /api/auth/login', () => {
  it.each(['admin', 'editor', 'counter', 'tech'] as const)('signs in the demo %s and answers the user without secrets', async (role) => {
    const response = await (
      await anonymous(t.app)
    )
      .post('/api/auth/login')
      .send({ email: `${role}@fitwright.test`, password: DEMO_PASSWORD })
    expect(response.status).toBe(200)
    expect(response.body).toMatchObject({ email: `${role}@fitwright.test`, role })
    expect(Object.keys(response.body).sort()).toEqual(['disabled', 'email', 'homeSiteId', 'id', 'invitePending', 'name', 'role'])
    const sessionCookie = ([] as string[]).concat(response.headers['set-cookie'] ?? []).find((c) => c.startsWith('fitwright.sid='))
    expect(sessionCookie).toMatch(/HttpOnly/)
  })

  it('accepts the e-mail in any case and with spaces around it', async () => {
    const response = await (
      await anonymous(t.app)
    )
      .post('/api/auth/login')
      .send({ email: '  Counter@Fitwright.TEST ', password: DEMO_PASSWORD })
    expect(response.status).toBe(200)
  })

  it('answers 401 with the same message for a wrong password and an unknown e-mail', async () => {
    const wrongPassword = await (
      await anonymous(t.app)
    )
      .post('/api/auth/login')
      .send({ email: 'counter@fitwright.test', password: 'not-it' })
    const unknownUser = await (
      await anonymous(t.app)
    )
      .post('/api/auth/login')
      .send({ email: 'nobody@fitwright.test', password: DEMO_PASSWORD })
    expect(wrongPassword.status).toBe(401)
    expect(unknownUser.status).toBe(401)
    expect(wrongPassword.body.error.message).toBe(unknownUser.body.error.message)
    expect(wrongPassword.body.error.message).not.toMatch(/password is wrong|no such user/i)
  })

  it('answers 400 with field messages when the body fails its schema', async () => {
    const response = await (await anonymous(t.app)).post('/api/auth/login').send({ email: 'not-an-email' })
    expect(response.status).toBe(400)
    const paths = response.body.error.details.map((detail: { path: string }) => detail.path)
    expect(paths).toEqual(expect.arrayContaining(['email', 'password']))
  })

  it('answers 400 for malformed JSON, without a stack trace', async () => {
    const response = await (await anonymous(t.app)).post('/api/auth/login').set('Content-Type', 'application/json').send('{"email": ')
    expect(response.status).toBe(400)
    expect(response.body.error.code).toBe('malformed_json')
    expect(JSON.stringify(response.body)).not.toMatch(/at .*\.(js|ts):\d+/)
  })

  it('issues a new session id on sign-in', async () => {
    const agent = await anonymous(t.app)
    await agent.post('/api/auth/login').send({ email: 'tech@fitwright.test', password: 'wrong' })
    const first = await agent.post('/api/auth/login').send({ email: 'tech@fitwright.test', password: DEMO_PASSWORD })
    // The new session has a new token: fetch it, as the page reads it from its cookie.
    await withCsrf(agent)
    const second = await agent.post('/api/auth/login').send({ email: 'tech@fitwright.test', password: DEMO_PASSWORD })
    const sid = (r: typeof first) =>
      ([] as string[])
        .concat(r.headers['set-cookie'] ?? [])
        .find((cookie) => cookie.startsWith('fitwright.sid='))
        ?.split(';')[0]
    expect(sid(first)).toBeDefined()
    expect(sid(second)).not.toBe(sid(first))
  })
})

describe('sign-in throttling', () => {
  it('answers 429 after too many failed sign-ins for one e-mail, and still lets another e-mail in', async () => {
    const own = await createTestApp({ env: { FITWRIGHT_LOGIN_ATTEMPTS: '3' } })
    const attempt = async (email: string, password: string) => (await anonymous(own.app)).post('/api/auth/login').send({ email, password })
    for (let i = 0; i < 3; i++) expect((await attempt('counter@fitwright.test', 'guess')).status).toBe(401)
    const blocked = await attempt('counter@fitwright.test', DEMO_PASSWORD)
    expect(blocked.status).toBe(429)
    expect(blocked.body.error.code).toBe('too_many_attempts')
    expect((await attempt('tech@fitwright.test', DEMO_PASSWORD)).status).toBe(200)
    await own.close()
  })
})

describe('sessions', () => {
  it('GET /api/auth/me answers the signed-in user and 401 after sign-out', async () => {
    const agent = await t.signIn('editor')
    const me = await agent.get('/api/auth/me')
    expect(me.status).toBe(200)
    expect(me.body.role).toBe('editor')
    expect((await agent.post('/api/auth/logout')).status).toBe(204)
    const after = await agent.get('/api/auth/me')
    expect(after.status).toBe(401)
    expect(after.body.error.code).toBe('unauthenticated')
  })

  it('keeps sessions in SQLite, not in memory', async () => {
    await t.signIn('counter')
    const [{ count }] = await t.dataSource.query('SELECT COUNT(*) AS count FROM user_session')
    expect(count).toBeGreaterThan(0)
  })

  it('answers 401 JSON for any other API route without a session, including unknown ones', async () => {
    for (const url of ['/api/parts', '/api/parts/TM-HD-2000', '/api/no-such-thing']) {
      const response = await request(t.app).get(url)
      expect(response.status, url).toBe(401)
      expect(response.type).toBe('application/json')
    }
  })

  it('answers 404 JSON for an unknown API route once signed in', async () => {
    const agent = await t.signIn('counter')
    const response = await agent.get('/api/no-such-thing')
    expect(response.status).toBe(404)
    expect(response.body.error.code).toBe('not_found')
  })
})
