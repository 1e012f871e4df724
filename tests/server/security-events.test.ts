import request from 'supertest'
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { uploadCsv } from '../helpers/imports'
import { anonymous, createTestApp, type TestApp } from '../helpers/test-app'

type Event = { kind: string; at: string; actorEmail: string | null; address: string | null; detail: string | null }

let t: TestApp
let admin: Awaited<ReturnType<TestApp['signIn']>>
beforeAll(async () => {
  t = await createTestApp()
  admin = await t.signIn('admin')
})
afterAll(() => t.close())

async function latest(kind: string): Promise<Event> {
  const response = await admin.get('/api/admin/security-events').query({ kind, pageSize: 1 })
  expect(response.status).toBe(200)
  return response.body.events[0] as Event
}

async function userId(email: string): Promise<number> {
  const users = (await admin.get('/api/users')).body as { id: number; email: string }[]
  return users.find((user) => user.email === email)!.id
}

const fromHere = expect.stringMatching(/127\.0\.0\.1|::1/)

describe('security events', () => {
  it('records a sign-in with who, when and from where', async () => {
    const started = Date.now()
    await t.signIn('tech')
    const event = await latest('sign_in')
    expect(event).toMatchObject({ actorEmail: 'tech@fitwright.test', address: fromHere })
    expect(Date.parse(event.at)).toBeGreaterThanOrEqual(started - 1000)
  })

  it('records a failed sign-in with the e-mail tried', async () => {
    await (await anonymous(t.app)).post('/api/auth/login').send({ email: 'counter@fitwright.test', password: 'not the password' })
    expect(await latest('sign_in_failed')).toMatchObject({ actorEmail: 'counter@fitwright.test', address: fromHere })
  })

  it('records a password change by the administrator, naming the account', async () => {
    await admin.patch(`/api/users/${await userId('counter@fitwright.test')}`).send({ password: 'crank pulley puller' })
    expect(await latest('password_change')).toMatchObject({
      actorEmail: 'admin@fitwright.test',
      detail: 'password of counter@fitwright.test',
    })
  })

  it('records a role change with the old and new role', async () => {
    const id = await userId('editor@fitwright.test')
    await admin.patch(`/api/users/${id}`).send({ role: 'counter' })
    expect(await latest('role_change')).toMatchObject({
      actorEmail: 'admin@fitwright.test',
      detail: 'editor@fitwright.test: editor to counter',
    })
    await admin.patch(`/api/users/${id}`).send({ role: 'editor' })
  })

  it('records disabling and enabling an account', async () => {
    const id = await userId('tech@fitwright.test')
    await admin.patch(`/api/users/${id}`).send({ disabled: true })
    expect(await latest('disable')).toMatchObject({ actorEmail: 'admin@fitwright.test', detail: 'tech@fitwright.test', address: fromHere })
    await admin.patch(`/api/users/${id}`).send({ disabled: false })
    expect(await latest('enable')).toMatchObject({ detail: 'tech@fitwright.test' })
  })

  it('records an import commit and its revert with the batch', async () => {
    const editor = await t.signIn('editor')
    const committed = await uploadCsv(
      editor,
      'part_number,kind,name,notes,chamber_cc,casting_marks\nTM-HD-2101,head,Audit head,,42,H20-3191\n',
      {
        type: 'parts',
        mode: 'commit',
      },
    )
    expect(committed.status).toBe(201)
    const batchId = committed.body.batchId as number
    expect(await latest('import')).toMatchObject({
      actorEmail: 'editor@fitwright.test',
      address: fromHere,
      detail: expect.stringContaining(`batch ${batchId}`),
    })
    expect((await editor.post(`/api/imports/${batchId}/revert`)).status).toBe(200)
    expect(await latest('revert')).toMatchObject({ actorEmail: 'editor@fitwright.test', detail: `batch ${batchId}` })
  })
})

describe('GET /api/admin/security-events', () => {
  it('pages newest first and counts them all', async () => {
    const first = await admin.get('/api/admin/security-events').query({ page: 1, pageSize: 2 })
    const second = await admin.get('/api/admin/security-events').query({ page: 2, pageSize: 2 })
    expect(first.body.events).toHaveLength(2)
    expect(first.body.total).toBeGreaterThan(4)
    expect(first.body.events[1].id).toBeGreaterThan(second.body.events[0].id)
  })

  it('answers 400 for a bad page size or kind, and 403 to anyone but an administrator', async () => {
    expect((await admin.get('/api/admin/security-events').query({ pageSize: 0 })).status).toBe(400)
    expect((await admin.get('/api/admin/security-events').query({ kind: 'coffee' })).status).toBe(400)
    const editor = await t.signIn('editor')
    expect((await editor.get('/api/admin/security-events')).status).toBe(403)
    expect((await request(t.app).get('/api/admin/security-events')).status).toBe(401)
  })
})
