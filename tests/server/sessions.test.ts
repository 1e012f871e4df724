import { setTimeout as sleep } from 'node:timers/promises'
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { anonymous, withCsrf, createTestApp, type TestApp } from '../helpers/test-app'

let t: TestApp
beforeAll(async () => {
  t = await createTestApp()
})
afterAll(() => t.close())

let serial = 0
/** A new counter account and an agent signed in to it. */
async function signedInNewUser(admin: Awaited<ReturnType<TestApp['signIn']>>) {
  serial += 1
  const email = `session.${serial}@shop.test`
  const password = `brake drum ${serial} wobble`
  const created = await admin.post('/api/users').send({ email, name: `Session ${serial}`, role: 'counter', password })
  expect(created.status).toBe(201)
  const agent = await anonymous(t.app)
  expect((await agent.post('/api/auth/login').send({ email, password })).status).toBe(200)
  await withCsrf(agent)
  return { id: created.body.id as number, email, password, agent }
}

describe('sessions end when the account changes', () => {
  it('answers 401 to the old session once an administrator changes the password', async () => {
    const admin = await t.signIn('admin')
    const user = await signedInNewUser(admin)
    expect((await user.agent.get('/api/auth/me')).status).toBe(200)
    const changed = await admin.patch(`/api/users/${user.id}`).send({ password: 'a fresh gasket set' })
    expect(changed.status).toBe(200)
    expect((await user.agent.get('/api/auth/me')).status).toBe(401)
    const again = await (await anonymous(t.app)).post('/api/auth/login').send({ email: user.email, password: 'a fresh gasket set' })
    expect(again.status).toBe(200)
  })

  it('answers 401 to the old session once the account is disabled, refuses sign-in, and lets it in again when enabled', async () => {
    const admin = await t.signIn('admin')
    const user = await signedInNewUser(admin)
    const disabled = await admin.patch(`/api/users/${user.id}`).send({ disabled: true })
    expect(disabled.body.disabled).toBe(true)
    expect((await user.agent.get('/api/auth/me')).status).toBe(401)
    const refused = await (await anonymous(t.app)).post('/api/auth/login').send({ email: user.email, password: user.password })
    expect(refused.status).toBe(403)
    expect(refused.body.error.code).toBe('account_disabled')
    await admin.patch(`/api/users/${user.id}`).send({ disabled: false })
    expect((await (await anonymous(t.app)).post('/api/auth/login').send({ email: user.email, password: user.password })).status).toBe(200)
  })

  it('keeps other users signed in when one account is disabled', async () => {
    const admin = await t.signIn('admin')
    const first = await signedInNewUser(admin)
    const second = await signedInNewUser(admin)
    await admin.patch(`/api/users/${first.id}`).send({ disabled: true })
    expect((await second.agent.get('/api/auth/me')).status).toBe(200)
  })

  it('keeps the acting session when administrators change their own password, and refuses disabling themselves', async () => {
    const admin = await t.signIn('admin')
    const me = (await admin.get('/api/auth/me')).body as { id: number }
    const otherAdminSession = await t.signIn('admin')
    expect((await admin.patch(`/api/users/${me.id}`).send({ disabled: true })).status).toBe(409)
    expect((await admin.patch(`/api/users/${me.id}`).send({ password: 'a fresh gasket set' })).status).toBe(200)
    expect((await admin.get('/api/auth/me')).status).toBe(200)
    expect((await otherAdminSession.get('/api/auth/me')).status).toBe(401)
  })
})

describe('the absolute session lifetime', () => {
  let short: TestApp
  beforeAll(async () => {
    // Two seconds, given in days as the setting is.
    short = await createTestApp({ env: { FITWRIGHT_SESSION_MAX_AGE_DAYS: String(2 / 86_400) } })
  })
  afterAll(() => short.close())

  it('ends a session that is used all the time once the lifetime since sign-in has passed', async () => {
    const agent = await short.signIn('tech')
    for (let step = 0; step < 3; step += 1) {
      expect((await agent.get('/api/auth/me')).status).toBe(200)
      await sleep(400)
    }
    await sleep(1200)
    expect((await agent.get('/api/auth/me')).status).toBe(401)
  })
})
