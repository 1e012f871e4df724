import { afterEach, describe, expect, it } from 'vitest'
import { MAX_ERROR_DETAILS, MAX_ERROR_TEXT, smallError } from '../../server/errors/error-handler'
import { createTestApp, type TestApp } from '../helpers/test-app'

let t: TestApp | undefined
afterEach(async () => {
  await t?.close()
  t = undefined
})

const bytesOf = (response: { text: string }) => Buffer.byteLength(response.text)

function unknownSlots(count: number, width = 8) {
  return Object.fromEntries(Array.from({ length: count }, (_, i) => [`s${String(i).padStart(width, '0')}`, 'TM-HD-2000']))
}

describe('error answers stay small', () => {
  it('POST /api/builds/evaluate with thousands of unknown slots answers one short 400', async () => {
    const app = (t = await createTestApp())
    const counter = await app.signIn('counter')
    const response = await counter.post('/api/builds/evaluate').send({ slots: unknownSlots(2500) })
    expect(response.status).toBe(400)
    expect(bytesOf(response)).toBeLessThan(2048)
    expect(response.body.error.details).toHaveLength(1)
    expect(response.body.error.details[0].message).toMatch(
      /^Unknown slot "s00000000", "s00000001", "s00000002" and 2497 more\. Slots are: /,
    )
  })

  it('POST /api/builds/evaluate with a 769 KB body answers a small 413', async () => {
    const app = (t = await createTestApp())
    const counter = await app.signIn('counter')
    const response = await counter.post('/api/builds/evaluate').send({ slots: unknownSlots(30_000, 12) })
    expect(response.status).toBe(413)
    expect(response.body.error.code).toBe('too_large')
    expect(bytesOf(response)).toBeLessThan(1024)
  })

  it('POST /api/builds with an unknown slot is refused before it is saved', async () => {
    const app = (t = await createTestApp())
    const tech = await app.signIn('tech')
    const response = await tech.post('/api/builds').send({ name: 'Test', slots: { head: 'TM-HD-2000', spoiler: 'X' } })
    expect(response.status).toBe(400)
    expect(response.body.error.details[0].message).toContain('Unknown slot "spoiler"')
    expect((await tech.get('/api/builds')).body.map((sheet: { name: string }) => sheet.name)).not.toContain('Test')
  })

  it('an error with 100 long details is answered with at most 20, each clipped', () => {
    const long = 'x'.repeat(5000)
    const details = Array.from({ length: 100 }, (_, i) => ({ path: `slots.s${i}`, message: long }))
    const body = smallError({ error: { code: 'bad_request', message: long, details } })
    expect(body.error.details).toHaveLength(MAX_ERROR_DETAILS)
    expect(body.error.message.length).toBe(MAX_ERROR_TEXT)
    expect(Buffer.byteLength(JSON.stringify(body))).toBeLessThan(MAX_ERROR_DETAILS * (MAX_ERROR_TEXT + 60) + MAX_ERROR_TEXT + 100)
  })
})
