import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { anonymous, createTestApp, type TestApp } from '../helpers/test-app'

let t: TestApp
beforeAll(async () => {
  t = await createTestApp()
})
afterAll(() => t.close())

describe('/api/users (administrators only)', () => {
  it.each(['editor', 'counter', 'tech'] as const)('answers 403 JSON to a %s', async (role) => {
    const agent = await t.signIn(role)
    const response = await agent.get('/api/users')
    expect(response.status).toBe(403)
    expect(response.body.error.code).toBe('forbidden')
  })

  it('lets an administrator list users and add one who can then sign in', async () => {
    const admin = await t.signIn('admin')
    const list = await admin.get('/api/users')
    expect(list.body.map((u: { role: string }) => u.role).sort()).toEqual(['admin', 'counter', 'editor', 'tech'])
    const created = await admin
      .post('/api/users')
      .send({ email: 'New.Counter@Shop.test', name: 'New Counter', role: 'counter', password: 'long-enough-1' })
    expect(created.status).toBe(201)
    expect(created.body.email).toBe('new.counter@shop.test')
    const login = await (await anonymous(t.app)).post('/api/auth/login').send({ email: 'new.counter@shop.test', password: 'long-enough-1' })
    expect(login.body.role).toBe('counter')
  })

  it('refuses a second user with the same e-mail with 409 naming the field', async () => {
    const admin = await t.signIn('admin')
    const response = await admin
      .post('/api/users')
      .send({ email: 'tech@fitwright.test', name: 'Copy', role: 'tech', password: 'long-enough-1' })
    expect(response.status).toBe(409)
    expect(response.body.error.details[0].path).toBe('email')
  })

  it('answers 400 with field messages for a short password and an unknown role', async () => {
    const admin = await t.signIn('admin')
    const response = await admin.post('/api/users').send({ email: 'a@b.test', name: 'A', role: 'boss', password: 'short' })
    expect(response.status).toBe(400)
    const paths = response.body.error.details.map((d: { path: string }) => d.path)
    expect(paths).toEqual(expect.arrayContaining(['role', 'password']))
  })

  it('changes a role, and the new role takes effect on the next request', async () => {
    const admin = await t.signIn('admin')
    const users = (await admin.get('/api/users')).body as { id: number; email: string }[]
    const tech = users.find((u) => u.email === 'tech@fitwright.test')!
    const techAgent = await t.signIn('tech')
    expect((await techAgent.get('/api/users')).status).toBe(403)
    const changed = await admin.patch(`/api/users/${tech.id}`).send({ role: 'admin' })
    expect(changed.body.role).toBe('admin')
    expect((await techAgent.get('/api/users')).status).toBe(200)
    await admin.patch(`/api/users/${tech.id}`).send({ role: 'tech' })
  })

  it('refuses to remove the role of the last administrator', async () => {
    const admin = await t.signIn('admin')
    const me = (await admin.get('/api/auth/me')).body as { id: number }
    const response = await admin.patch(`/api/users/${me.id}`).send({ role: 'counter' })
    expect(response.status).toBe(409)
    expect((await admin.get('/api/auth/me')).body.role).toBe('admin')
  })
})
