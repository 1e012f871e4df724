import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { loadRules } from '../../server/reasoning/rule-loader'
import { ModificationService } from '../../server/catalogue/modification.service'
import { createTestApp, type TestApp } from '../helpers/test-app'

let t: TestApp
beforeAll(async () => {
  t = await createTestApp()
})
afterAll(() => t.close())

const row = async (name: string) =>
  (
    (await t.db.all('SELECT "title", "updatedAt", "status", "source" FROM modification WHERE "name" = ?', [name])) as {
      title: string
      updatedAt: string
    }[]
  )[0]!

describe('shipped modification catalogue', () => {
  const specs = loadRules('rules').modifications

  it('is in the database with its steps, as rules and links name it', async () => {
    const editor = await t.signIn('editor')
    const all = (await editor.get('/api/modifications')).body as { name: string; steps: string[]; status: string }[]
    for (const spec of specs) {
      const found = all.find((m) => m.name === spec.name)!
      expect(found.steps).toEqual(spec.steps)
      expect(found.status).toBe('approved')
    }
  })

  it('leaves unchanged entries alone at the next start and updates a changed one', async () => {
    const service = new ModificationService(t.dataSource)
    const before = await row('vvl-lockout')
    await new Promise((resolve) => setTimeout(resolve, 20))
    await service.syncShipped(specs)
    expect(await row('vvl-lockout')).toEqual(before)
    await service.syncShipped(specs.map((spec) => (spec.name === 'vvl-lockout' ? { ...spec, title: 'Base profile only' } : spec)))
    expect((await row('vvl-lockout')).title).toBe('Base profile only')
    await service.syncShipped(specs)
  })
})
