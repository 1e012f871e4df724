import { afterEach, describe, expect, it } from 'vitest'
import { FORGOT_ANSWER } from '../../server/auth/account.routes'
import { DEMO_PASSWORD } from '../../server/demo/seed'
import { anonymous, createTestApp, type TestApp } from '../helpers/test-app'
import { passwordLink, receivedMail } from '../helpers/mailbox'

let t: TestApp
afterEach(() => t.close())

const NEW_PASSWORD = 'torque-in-three-stages-7'

async function delivered() {
  await t.services.accounts.resetsQueued()
  await t.services.outbox.deliverDue()
  return receivedMail(t.config.mailDir)
}

async function signInWith(email: string, password: string) {
  return (await anonymous(t.app)).post('/api/auth/login').send({ email, password })
}

describe('"Forgot password": a time-limited, single-use link by mail', { timeout: 30_000 }, () => {
  it('answers the same for a known and an unknown e-mail, and mails only the known one', async () => {
    t = await createTestApp()
    const visitor = await anonymous(t.app)
    const known = await visitor.post('/api/auth/forgot-password').send({ email: 'Tech@Fitwright.test' })
    const unknown = await visitor.post('/api/auth/forgot-password').send({ email: 'nobody@fitwright.test' })
    expect(known.status).toBe(202)
    expect(unknown.status).toBe(202)
    expect(unknown.body).toEqual(known.body)
    expect(known.body).toEqual({ message: FORGOT_ANSWER })
    const mails = await delivered()
    expect(mails.map((mail) => [mail.to, mail.subject])).toEqual([['tech@fitwright.test', 'Set a new Fitwright password']])
  })

  it('sets a new password from the link, ends the sessions of the account, and the link then works no more', async () => {
    t = await createTestApp()
    const techElsewhere = await t.signIn('tech')
    const visitor = await anonymous(t.app)
    await visitor.post('/api/auth/forgot-password').send({ email: 'tech@fitwright.test' })
    const { token } = passwordLink((await delivered())[0]!)
    expect((await visitor.post('/api/auth/password-link').send({ token })).body).toMatchObject({
      purpose: 'reset',
      email: 'tech@fitwright.test',
    })
    expect((await visitor.post('/api/auth/set-password').send({ token, password: NEW_PASSWORD })).status).toBe(200)
    expect((await techElsewhere.get('/api/auth/me')).status).toBe(401)
    expect((await signInWith('tech@fitwright.test', DEMO_PASSWORD)).status).toBe(401)
    expect((await signInWith('tech@fitwright.test', NEW_PASSWORD)).status).toBe(200)
    expect((await visitor.post('/api/auth/set-password').send({ token, password: 'yet-another-one-88' })).status).toBe(400)
    const admin = await t.signIn('admin')
    const kinds = (await admin.get('/api/admin/security-events')).body.events.map((e: { kind: string }) => e.kind)
    expect(kinds).toEqual(expect.arrayContaining(['password_reset_request', 'password_reset']))
  })

  it('retires an earlier reset link when a newer one is sent', async () => {
    t = await createTestApp()
    const visitor = await anonymous(t.app)
    await visitor.post('/api/auth/forgot-password').send({ email: 'counter@fitwright.test' })
    await visitor.post('/api/auth/forgot-password').send({ email: 'counter@fitwright.test' })
    const [older, newer] = (await delivered()).map(passwordLink)
    expect((await visitor.post('/api/auth/password-link').send({ token: older!.token })).status).toBe(400)
    expect((await visitor.post('/api/auth/password-link').send({ token: newer!.token })).status).toBe(200)
  })

  it('mails a disabled account nothing', async () => {
    t = await createTestApp()
    const admin = await t.signIn('admin')
    const users = (await admin.get('/api/users')).body as { id: number; email: string }[]
    await admin.patch(`/api/users/${users.find((u) => u.email === 'counter@fitwright.test')!.id}`).send({ disabled: true })
    const answer = await (await anonymous(t.app)).post('/api/auth/forgot-password').send({ email: 'counter@fitwright.test' })
    expect(answer.status).toBe(202)
    expect(await delivered()).toEqual([])
  })

  it('sends one e-mail at most three links an hour, still answering the same', async () => {
    t = await createTestApp()
    const visitor = await anonymous(t.app)
    for (let i = 0; i < 5; i++) {
      expect((await visitor.post('/api/auth/forgot-password').send({ email: 'editor@fitwright.test' })).status).toBe(202)
    }
    expect(await delivered()).toHaveLength(3)
  })

  it('tells an address asking too often to wait, with Retry-After', async () => {
    t = await createTestApp({ env: { FITWRIGHT_RESET_REQUESTS_PER_ADDRESS: '2' } })
    const visitor = await anonymous(t.app)
    await visitor.post('/api/auth/forgot-password').send({ email: 'a@shop.test' })
    await visitor.post('/api/auth/forgot-password').send({ email: 'b@shop.test' })
    const third = await visitor.post('/api/auth/forgot-password').send({ email: 'tech@fitwright.test' })
    expect(third.status).toBe(429)
    expect(Number(third.headers['retry-after'])).toBeGreaterThan(0)
    expect(third.body.error.message).toMatch(/Try again in \d+ minutes/)
    expect(await delivered()).toEqual([])
  })

  it('answers 400 to an address that is not one', async () => {
    t = await createTestApp()
    const answer = await (await anonymous(t.app)).post('/api/auth/forgot-password').send({ email: 'tech' })
    expect(answer.status).toBe(400)
    expect(answer.body.error.details[0].path).toBe('email')
  })
})

describe("changing one's own password, giving the current one", { timeout: 30_000 }, () => {
  it("refuses a wrong current password, then changes it and ends the user's other sessions but this one", async () => {
    t = await createTestApp()
    const tech = await t.signIn('tech')
    const techElsewhere = await t.signIn('tech')
    const wrong = await tech.post('/api/auth/change-password').send({ currentPassword: 'not-it-at-all', password: NEW_PASSWORD })
    expect(wrong.status).toBe(400)
    expect(wrong.body.error.details[0].path).toBe('currentPassword')
    const changed = await tech.post('/api/auth/change-password').send({ currentPassword: DEMO_PASSWORD, password: NEW_PASSWORD })
    expect(changed.status).toBe(204)
    expect((await tech.get('/api/auth/me')).status).toBe(200)
    expect((await techElsewhere.get('/api/auth/me')).status).toBe(401)
    expect((await signInWith('tech@fitwright.test', DEMO_PASSWORD)).status).toBe(401)
    expect((await signInWith('tech@fitwright.test', NEW_PASSWORD)).status).toBe(200)
  })

  it('refuses a common or unchanged new password, and anyone not signed in', async () => {
    t = await createTestApp()
    const tech = await t.signIn('tech')
    const common = await tech.post('/api/auth/change-password').send({ currentPassword: DEMO_PASSWORD, password: 'password123' })
    expect(common.status).toBe(400)
    expect(common.body.error.details[0].path).toBe('password')
    const same = await tech.post('/api/auth/change-password').send({ currentPassword: DEMO_PASSWORD, password: DEMO_PASSWORD })
    expect(same.status).toBe(400)
    const visitor = await anonymous(t.app)
    expect((await visitor.post('/api/auth/change-password').send({ currentPassword: 'x', password: NEW_PASSWORD })).status).toBe(401)
  })

  it('counts wrong current passwords as failed sign-ins, so guessing runs into the lockout', async () => {
    t = await createTestApp({ env: { FITWRIGHT_LOGIN_ATTEMPTS: '2' } })
    const tech = await t.signIn('tech')
    for (let i = 0; i < 2; i++) await tech.post('/api/auth/change-password').send({ currentPassword: `guess-${i}`, password: NEW_PASSWORD })
    const locked = await tech.post('/api/auth/change-password').send({ currentPassword: DEMO_PASSWORD, password: NEW_PASSWORD })
    expect(locked.status).toBe(429)
  })
})
