import { createHash } from 'node:crypto'
import { afterEach, describe, expect, it } from 'vitest'
import { anonymous, createTestApp, type TestApp } from '../helpers/test-app'
import { passwordLink, receivedMail } from '../helpers/mailbox'

let t: TestApp
afterEach(() => t.close())

const NEW_PASSWORD = 'torque-in-three-stages-7'

async function deliveredTo(email: string) {
  await t.services.outbox.deliverDue()
  return receivedMail(t.config.mailDir).filter((mail) => mail.to === email)
}

async function signInWith(email: string, password: string) {
  return (await anonymous(t.app)).post('/api/auth/login').send({ email, password })
}

describe('inviting a user, who chooses a password from the mailed link', { timeout: 30_000 }, () => {
  it('makes the account without a password, mails a one-time link, and the link sets the password once', async () => {
    t = await createTestApp()
    const admin = await t.signIn('admin')
    const invited = await admin.post('/api/users/invite').send({ email: 'New.Tech@Shop.test', name: 'New Tech', role: 'tech' })
    expect(invited.status).toBe(201)
    expect(invited.body).toMatchObject({ email: 'new.tech@shop.test', role: 'tech', invitePending: true, disabled: false })
    // No password works before the link is used, not even an empty one.
    expect((await signInWith('new.tech@shop.test', 'no such user')).status).toBe(401)

    const [mail, ...more] = await deliveredTo('new.tech@shop.test')
    expect(more).toEqual([])
    expect(mail!.subject).toBe('You are invited to Fitwright')
    expect(mail!.text).toContain('Hello New Tech,')
    expect(mail!.raw).toContain('text/html')
    const { token } = passwordLink(mail!)

    const visitor = await anonymous(t.app)
    const info = await visitor.post('/api/auth/password-link').send({ token })
    expect(info.body).toEqual({ purpose: 'invite', email: 'new.tech@shop.test', name: 'New Tech' })
    const set = await visitor.post('/api/auth/set-password').send({ token, password: NEW_PASSWORD })
    expect(set.status).toBe(200)
    expect(set.body).toEqual({ email: 'new.tech@shop.test' })
    expect((await signInWith('new.tech@shop.test', NEW_PASSWORD)).body.role).toBe('tech')
    const listed = (await admin.get('/api/users')).body.find((u: { email: string }) => u.email === 'new.tech@shop.test')
    expect(listed.invitePending).toBe(false)

    const again = await visitor.post('/api/auth/set-password').send({ token, password: 'another-long-one-42' })
    expect(again.status).toBe(400)
    expect(again.body.error.code).toBe('link_unusable')
    expect((await signInWith('new.tech@shop.test', 'another-long-one-42')).status).toBe(401)
  })

  it('keeps only the hash of the token in the database', async () => {
    t = await createTestApp()
    const admin = await t.signIn('admin')
    await admin.post('/api/users/invite').send({ email: 'hash@shop.test', name: 'Hash Check', role: 'counter' })
    const { token } = passwordLink((await deliveredTo('hash@shop.test'))[0]!)
    const rows: { tokenHash: string }[] = await t.dataSource.query('SELECT "tokenHash" FROM "account_token"')
    expect(rows).toHaveLength(1)
    expect(rows[0]!.tokenHash).toBe(createHash('sha256').update(token).digest('hex'))
    expect(JSON.stringify(rows)).not.toContain(token)
  })

  it('refuses a link past its time', async () => {
    t = await createTestApp()
    const admin = await t.signIn('admin')
    await admin.post('/api/users/invite').send({ email: 'late@shop.test', name: 'Late Comer', role: 'counter' })
    const { token } = passwordLink((await deliveredTo('late@shop.test'))[0]!)
    await t.db.run('UPDATE "account_token" SET "expiresAt" = ?', [new Date('2000-01-01T00:00:00Z')])
    const visitor = await anonymous(t.app)
    const info = await visitor.post('/api/auth/password-link').send({ token })
    expect(info.status).toBe(400)
    expect(info.body.error.message).toMatch(/expired or was used/)
    expect((await visitor.post('/api/auth/set-password').send({ token, password: NEW_PASSWORD })).status).toBe(400)
  })

  it('sends a new invitation on request, and the earlier link stops working', async () => {
    t = await createTestApp()
    const admin = await t.signIn('admin')
    const { body: user } = await admin.post('/api/users/invite').send({ email: 'twice@shop.test', name: 'Twice Asked', role: 'editor' })
    const first = passwordLink((await deliveredTo('twice@shop.test'))[0]!).token
    expect((await admin.post(`/api/users/${user.id}/invite`)).status).toBe(200)
    const mails = await deliveredTo('twice@shop.test')
    expect(mails).toHaveLength(2)
    const second = passwordLink(mails[1]!).token
    const visitor = await anonymous(t.app)
    expect((await visitor.post('/api/auth/password-link').send({ token: first })).status).toBe(400)
    expect((await visitor.post('/api/auth/set-password').send({ token: second, password: NEW_PASSWORD })).status).toBe(200)
    // Once the password is set there is nothing to invite to.
    expect((await admin.post(`/api/users/${user.id}/invite`)).status).toBe(409)
  })

  it('retires the invitation when an administrator sets the password instead', async () => {
    t = await createTestApp()
    const admin = await t.signIn('admin')
    const { body: user } = await admin.post('/api/users/invite').send({ email: 'handed@shop.test', name: 'Handed Over', role: 'tech' })
    const { token } = passwordLink((await deliveredTo('handed@shop.test'))[0]!)
    expect((await admin.patch(`/api/users/${user.id}`).send({ password: NEW_PASSWORD })).body.invitePending).toBe(false)
    expect((await (await anonymous(t.app)).post('/api/auth/password-link').send({ token })).status).toBe(400)
  })

  it('refuses a taken e-mail, bad input, a common password, and anyone but an administrator', async () => {
    t = await createTestApp()
    const admin = await t.signIn('admin')
    const taken = await admin.post('/api/users/invite').send({ email: 'tech@fitwright.test', name: 'Copy', role: 'tech' })
    expect(taken.status).toBe(409)
    expect(taken.body.error.details[0].path).toBe('email')
    const bad = await admin.post('/api/users/invite').send({ email: 'not-an-address', name: '', role: 'boss' })
    expect(bad.status).toBe(400)
    expect(bad.body.error.details.map((d: { path: string }) => d.path)).toEqual(expect.arrayContaining(['email', 'name', 'role']))
    const editor = await t.signIn('editor')
    expect((await editor.post('/api/users/invite').send({ email: 'x@shop.test', name: 'X', role: 'tech' })).status).toBe(403)
    // Nothing was queued by any of these.
    expect(await deliveredTo('x@shop.test')).toEqual([])

    await admin.post('/api/users/invite').send({ email: 'common@shop.test', name: 'Common', role: 'tech' })
    const { token } = passwordLink((await deliveredTo('common@shop.test'))[0]!)
    const visitor = await anonymous(t.app)
    const common = await visitor.post('/api/auth/set-password').send({ token, password: 'password123' })
    expect(common.status).toBe(400)
    expect(common.body.error.details[0].path).toBe('password')
    // A refused password leaves the link usable.
    expect((await visitor.post('/api/auth/set-password').send({ token, password: NEW_PASSWORD })).status).toBe(200)
    expect((await visitor.post('/api/auth/set-password').send({ token: 'short' })).status).toBe(400)
  })
})
