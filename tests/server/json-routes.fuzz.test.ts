import fc from 'fast-check'
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { createTestApp, type TestApp } from '../helpers/test-app'

type Agent = Awaited<ReturnType<TestApp['signIn']>>

// Every route that reads a JSON body (sign-in is left to its own tests: its throttle would answer 429).
const ROUTES = [
  ['post', '/api/builds/evaluate'],
  ['post', '/api/builds/complete'],
  ['post', '/api/builds/fill'],
  ['post', '/api/builds'],
  ['put', '/api/builds/1'],
  ['post', '/api/links'],
  ['patch', '/api/links/1'],
  ['post', '/api/identities'],
  ['post', '/api/users'],
  ['patch', '/api/users/2'],
  ['post', '/api/users/invite'],
  ['post', '/api/auth/forgot-password'],
  ['post', '/api/auth/password-link'],
  ['post', '/api/auth/set-password'],
  ['post', '/api/auth/change-password'],
] as const

const SLOT_WORDS = ['head', 'block', 'ecu', 'slots', 'name', 'partNumber', 'TM-HD-2000', '__proto__', 'constructor']
const body = fc.oneof(
  fc.jsonValue({ maxDepth: 3 }),
  fc.dictionary(fc.constantFrom(...SLOT_WORDS), fc.jsonValue({ maxDepth: 2 }), { maxKeys: 6 }),
  fc.record({ slots: fc.dictionary(fc.oneof(fc.constantFrom(...SLOT_WORDS), fc.string()), fc.jsonValue({ maxDepth: 1 })) }),
)

let t: TestApp
let admin: Agent
beforeAll(async () => {
  t = await createTestApp()
  admin = await t.signIn('admin')
})
afterAll(() => t.close())

describe('every JSON route under random bodies', () => {
  it.each(ROUTES)(
    '%s %s never answers 5xx and keeps error answers small',
    async (method, route) => {
      await fc.assert(
        fc.asyncProperty(body, async (value) => {
          const response = await admin[method](route).set('Content-Type', 'application/json').send(JSON.stringify(value))
          expect(response.status).toBeLessThan(500)
          if (response.status >= 400) {
            expect(Buffer.byteLength(response.text)).toBeLessThan(16 * 1024)
            expect(typeof response.body.error?.message).toBe('string')
          }
        }),
        { numRuns: 30 },
      )
    },
    60_000,
  )
})
