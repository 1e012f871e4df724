import type { AddressInfo } from 'node:net'
import request from 'supertest'
import { afterEach, beforeEach, describe, expect, it } from 'vitest'
import { DEMO_PASSWORD } from '../../server/demo/seed'
import { createTestApp, withCsrf, type TestApp } from '../helpers/test-app'

let t: TestApp
beforeEach(async () => {
  t = await createTestApp()
})
afterEach(() => t.close())

const LINK = { fromPart: 'TM-HD-1810', toPart: 'TM-BL-2000', relation: 'fits' }

describe('CSRF: state-changing requests need the session token and our own origin', () => {
  it('hands out a token before sign-in and a new one after it', async () => {
    const agent = request.agent(t.app)
    const before = (await agent.get('/api/auth/csrf')).body.token as string
    expect(before).toMatch(/^[\w-]{40,}$/)
    const login = await agent
      .post('/api/auth/login')
      .set('x-csrf-token', before)
      .send({ email: 'editor@fitwright.test', password: DEMO_PASSWORD })
    expect(login.status).toBe(200)
    const after = (await agent.get('/api/auth/csrf')).body.token as string
    expect(after).not.toBe(before)
    // The token from before sign-in belongs to a session that is gone.
    expect((await agent.post('/api/links').set('x-csrf-token', before).send(LINK)).status).toBe(403)
    expect((await agent.post('/api/links').set('x-csrf-token', after).send(LINK)).status).toBe(201)
  })

  it('refuses a post, a patch and a delete without the token, and a sign-in without one', async () => {
    const editor = await t.signIn('editor')
    const bare = request(t.app)
    const noToken = await bare.post('/api/auth/login').send({ email: 'editor@fitwright.test', password: DEMO_PASSWORD })
    expect(noToken.status).toBe(403)
    expect(noToken.body.error.code).toBe('csrf')
    const created = await editor.post('/api/links').send(LINK)
    expect(created.status).toBe(201)
    editor.set('x-csrf-token', 'not-the-token')
    expect((await editor.patch(`/api/links/${created.body.id}`).send({ note: 'x' })).status).toBe(403)
    expect((await editor.delete(`/api/links/${created.body.id}`)).status).toBe(403)
    await withCsrf(editor)
    expect((await editor.delete(`/api/links/${created.body.id}`)).status).toBe(204)
  })

  it('refuses a form post and a multipart upload from another site even with the cookie', async () => {
    const editor = await t.signIn('editor')
    const batches = (await editor.get('/api/imports')).body as { id: number }[]
    const revert = await editor
      .post(`/api/imports/${batches[0]!.id}/revert`)
      .set('Origin', 'http://evil.example')
      .type('form')
      .send('confirm=1')
    expect(revert.status).toBe(403)
    expect(revert.body.error.code).toBe('cross_origin')
    const upload = await editor
      .post('/api/imports')
      .set('Referer', 'http://127.0.0.1:9/attack.html')
      .field('type', 'parts')
      .field('mode', 'commit')
      .attach('file', Buffer.from('part_number,kind,name\nTM-X-9,other,Shim\n'), 'parts.csv')
    expect(upload.status).toBe(403)
    expect((await editor.get('/api/parts/TM-X-9')).status).toBe(404)
    expect((await editor.get('/api/imports')).body).toHaveLength(batches.length)
  })

  it('lets a page or a script that sends its own origin and the token through', async () => {
    const server = t.app.listen(0, '127.0.0.1')
    try {
      await new Promise((resolve) => server.once('listening', resolve))
      const { port } = server.address() as AddressInfo
      const agent = await withCsrf(request.agent(server))
      const login = await agent
        .post('/api/auth/login')
        .set('Origin', `http://127.0.0.1:${port}`)
        .send({ email: 'tech@fitwright.test', password: DEMO_PASSWORD })
      expect(login.status, JSON.stringify(login.body)).toBe(200)
    } finally {
      server.close()
    }
  })
})
