import Database from 'better-sqlite3'
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { createTestApp, type TestApp } from '../helpers/test-app'

let t: TestApp
beforeAll(async () => {
  t = await createTestApp()
})
afterAll(() => t.close())

/*
 * The import worker writes on its own connection and holds SQLite's write lock for
 * the whole commit. A sheet saved meanwhile waits its turn instead of failing.
 */
describe('saving a build sheet while another connection holds the write lock', () => {
  it('waits for the lock and saves, updates and deletes the sheet once it is free', async () => {
    const tech = await t.signIn('tech')
    const other = new Database(t.config.dbPath)
    try {
      const hold = async <T>(request: () => Promise<T>): Promise<T> => {
        other.exec('BEGIN IMMEDIATE')
        const pending = request()
        await new Promise((resolve) => setTimeout(resolve, 300))
        other.exec('COMMIT')
        return pending
      }
      const created = await hold(async () => tech.post('/api/builds').send({ name: 'Held', slots: { head: 'TM-HD-2000' } }))
      expect(created.status).toBe(201)
      const updated = await hold(async () =>
        tech.put(`/api/builds/${created.body.id}`).send({ name: 'Held, renamed', faceFinish: { deckRaUm: 1.2 } }),
      )
      expect(updated.status).toBe(200)
      expect(updated.body).toMatchObject({ name: 'Held, renamed', faceFinish: { deckRaUm: 1.2 } })
      const removed = await hold(async () => tech.delete(`/api/builds/${created.body.id}`))
      expect(removed.status).toBe(204)
      expect((await tech.get(`/api/builds/${created.body.id}`)).status).toBe(404)
    } finally {
      other.close()
    }
  })
})
