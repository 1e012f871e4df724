import { existsSync, mkdtempSync, readdirSync, rmSync, writeFileSync } from 'node:fs'
import { tmpdir } from 'node:os'
import path from 'node:path'
import request from 'supertest'
import { afterEach, describe, expect, it } from 'vitest'
import { createApp } from '../../server/app'
import { uploadCsv } from '../helpers/imports'
import { createTestApp, type TestApp, withCsrf } from '../helpers/test-app'

let t: TestApp | undefined
afterEach(async () => {
  await t?.close()
  t = undefined
})

describe('leftovers', () => {
  it('empties its own upload folder at start-up', async () => {
    const app = (t = await createTestApp())
    const stray = path.join(app.config.uploadTempDir, 'left-by-a-crash')
    writeFileSync(stray, 'x'.repeat(1000))
    await createApp({ ...app, version: 'test' })
    expect(existsSync(stray)).toBe(false)
  })

  it('leaves no upload file behind after a good, a bad and a too large upload', async () => {
    const app = (t = await createTestApp({ env: { FITWRIGHT_IMPORT_MAX_BYTES: '2000' } }))
    const editor = await app.signIn('editor')
    expect((await uploadCsv(editor, 'part_number,kind,name\nTM-X-1,other,Spacer\n', { type: 'parts' })).status).toBe(200)
    expect((await uploadCsv(editor, 'nonsense\n', { type: 'parts' })).status).toBe(400)
    expect((await uploadCsv(editor, 'x'.repeat(5000), { type: 'parts' })).status).toBe(413)
    await new Promise((resolve) => setTimeout(resolve, 50))
    expect(readdirSync(app.config.uploadTempDir)).toEqual([])
  })

  it.each(['__proto__', 'constructor', 'prototype'])('refuses a parts file with an attribute column named %s', async (column) => {
    const app = (t = await createTestApp())
    const editor = await app.signIn('editor')
    const response = await uploadCsv(editor, `part_number,kind,name,${column}\nTM-X-1,other,Spacer,1\n`, { type: 'parts' })
    expect(response.status).toBe(400)
    expect(response.body.error.message).toContain(`Column "${column}" cannot be used`)
  })

  it('POST /api/auth/logout without a session answers 401', async () => {
    const app = (t = await createTestApp())
    const agent = await app.signIn('counter')
    expect((await agent.post('/api/auth/logout')).status).toBe(204)
    // A fresh token, as the page has one before it signs in: the session is what is missing.
    await withCsrf(agent)
    const again = await agent.post('/api/auth/logout')
    expect(again.status).toBe(401)
    expect(again.body.error.code).toBe('unauthenticated')
  })

  it('answers 404 for missing static files and the app page for page addresses', async () => {
    const app = (t = await createTestApp())
    const clientDir = mkdtempSync(path.join(tmpdir(), 'fitwright-client-'))
    writeFileSync(path.join(clientDir, 'index.html'), '<!doctype html><title>app page</title>')
    try {
      const server = await createApp({ ...app, version: 'test', clientDir })
      expect((await request(server).get('/assets/nonexistent.js')).status).toBe(404)
      expect((await request(server).get('/favicon.ico')).status).toBe(404)
      const page = await request(server).get('/parts/TM-HD-2000')
      expect(page.status).toBe(200)
      expect(page.text).toContain('app page')
      expect((await request(server).get('/parts/TM-X-1.5')).text).toContain('app page')
    } finally {
      rmSync(clientDir, { recursive: true, force: true })
    }
  })
})
