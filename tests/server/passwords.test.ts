import bcrypt from 'bcryptjs'
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { DEMO_PASSWORD } from '../../server/demo/seed'
import { anonymous, createTestApp, type TestApp } from '../helpers/test-app'

let t: TestApp
beforeAll(async () => {
  t = await createTestApp()
})
afterAll(() => t.close())

async function storedHash(email: string): Promise<string> {
  const [row] = (await t.db.all('SELECT "passwordHash" FROM "user" WHERE "email" = ?', [email])) as { passwordHash: string }[]
  return row!.passwordHash
}

describe('new passwords', () => {
  // NIST SP 800-63B section 5.1.1.2: new secrets are compared against a list of commonly used, expected or compromised values.
  it.each([DEMO_PASSWORD, '1234567890', 'Password123', 'qwertyuiop', 'iloveyou123'])(
    'refuses the common password %s for a new account with 400 on the password field',
    async (password) => {
      const admin = await t.signIn('admin')
      const response = await admin.post('/api/users').send({ email: 'weak@shop.test', name: 'Weak', role: 'counter', password })
      expect(response.status).toBe(400)
      expect(response.body.error.details).toEqual([{ path: 'password', message: expect.stringContaining('common passwords') }])
    },
  )

  it('refuses a common password when an administrator changes one', async () => {
    const admin = await t.signIn('admin')
    const users = (await admin.get('/api/users')).body as { id: number; email: string }[]
    const tech = users.find((user) => user.email === 'tech@fitwright.test')!
    const response = await admin.patch(`/api/users/${tech.id}`).send({ password: '1234567890' })
    expect(response.status).toBe(400)
    expect(response.body.error.details[0].path).toBe('password')
  })

  it('refuses a password over 72 UTF-8 bytes even when it has fewer characters, and takes one of exactly 72', async () => {
    const admin = await t.signIn('admin')
    // 37 characters, 74 bytes: each é is two bytes in UTF-8.
    const long = 'é'.repeat(37)
    const refused = await admin.post('/api/users').send({ email: 'long@shop.test', name: 'Long', role: 'counter', password: long })
    expect(refused.status).toBe(400)
    expect(refused.body.error.details).toEqual([{ path: 'password', message: expect.stringContaining('72 bytes') }])
    const exact = 'rocker cover bolts '.repeat(4).slice(0, 72)
    const taken = await admin.post('/api/users').send({ email: 'long@shop.test', name: 'Long', role: 'counter', password: exact })
    expect(taken.status).toBe(201)
  })

  it('hashes a new password at bcrypt cost 12', async () => {
    const admin = await t.signIn('admin')
    await admin.post('/api/users').send({ email: 'cost@shop.test', name: 'Cost', role: 'counter', password: 'timing chain tensioner' })
    expect(bcrypt.getRounds(await storedHash('cost@shop.test'))).toBe(12)
  })
})

describe('stored hashes', () => {
  it('makes a cheaper stored hash again at cost 12 when the user signs in, and the password still works', async () => {
    expect(bcrypt.getRounds(await storedHash('counter@fitwright.test'))).toBe(10)
    const first = await (await anonymous(t.app)).post('/api/auth/login').send({ email: 'counter@fitwright.test', password: DEMO_PASSWORD })
    expect(first.status).toBe(200)
    expect(bcrypt.getRounds(await storedHash('counter@fitwright.test'))).toBe(12)
    const again = await (await anonymous(t.app)).post('/api/auth/login').send({ email: 'counter@fitwright.test', password: DEMO_PASSWORD })
    expect(again.status).toBe(200)
  })

  it('leaves the hash alone after a failed sign-in', async () => {
    const before = await storedHash('editor@fitwright.test')
    await (await anonymous(t.app)).post('/api/auth/login').send({ email: 'editor@fitwright.test', password: 'not the password' })
    expect(await storedHash('editor@fitwright.test')).toBe(before)
  })
})
