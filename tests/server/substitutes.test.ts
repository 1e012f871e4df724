import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { SubstitutesService } from '../../server/fitment/substitutes.service'
import { expectBadRequest } from '../helpers/expect-error'
import { createTestApp, type TestApp } from '../helpers/test-app'

let t: TestApp
let counter: Awaited<ReturnType<TestApp['signIn']>>
type Item = {
  part: { partNumber: string }
  sharedCount: number
  shared: string[]
  differences: { name: string; this: unknown; other: unknown }[]
}
const numbers = (body: { items: Item[] }) => body.items.map((item) => item.part.partNumber)

beforeAll(async () => {
  t = await createTestApp()
  counter = await t.signIn('counter')
})
afterAll(() => t.close())

describe('GET /api/parts/:partNumber/substitutes', () => {
  it('answers heads that fit the same block, ranked by shared mating parts, with the attributes that differ', async () => {
    // Demo links: TM-HD-1810 fits TM-BL-1800; so do TM-HD-1800 (fits) and TM-HD-2000 (with modification).
    const response = await counter.get('/api/parts/TM-HD-1810/substitutes')
    expect(response.status).toBe(200)
    expect(numbers(response.body)).toEqual(['TM-HD-1800', 'TM-HD-2000'])
    const early = response.body.items[0] as Item
    expect(early.shared).toEqual(['TM-BL-1800'])
    expect(early.sharedCount).toBe(1)
    // The late head's chamber is 46 cc, the early one's 48 cc; bolt pattern and bosses are the same.
    expect(early.differences).toContainEqual({ name: 'chamberCc', this: 46, other: 48 })
    expect(early.differences.map((d) => d.name)).not.toContain('headBoltPattern')
    expect(response.body.capped).toBe(false)
  })

  it('never offers the part itself or an identical number, and only parts of the same kind', async () => {
    const response = await counter.get('/api/parts/TM-BL-2000/substitutes')
    expect(numbers(response.body)).toContain('TM-BL-1800')
    expect(numbers(response.body)).not.toContain('TM-BL-2000')
    expect(numbers(response.body)).not.toContain('TM-BL-2001')
    expect(response.body.items.every((item: Item & { part: { kind: string } }) => item.part.kind === 'block')).toBe(true)
  })

  it('answers an empty list for a part with no reviewed fits', async () => {
    const response = await counter.get('/api/parts/TM-HD-2050/substitutes')
    expect(response.status).toBe(200)
    expect(response.body).toMatchObject({ total: 0, items: [], capped: false })
  })

  it('pages the ranked answer with an honest total', async () => {
    const first = await counter.get('/api/parts/TM-HD-1810/substitutes?pageSize=1')
    const second = await counter.get('/api/parts/TM-HD-1810/substitutes?pageSize=1&page=2')
    expect(first.body.total).toBe(2)
    expect([...numbers(first.body), ...numbers(second.body)]).toEqual(['TM-HD-1800', 'TM-HD-2000'])
  })

  it('for a hub part beyond the caps, weighs only the first mating parts and says the answer is capped', async () => {
    // TM-BL-1800 fits several heads; with room for one link per part the answer must be cut short.
    const capped = new SubstitutesService(t.services.parts, t.services.graphIndex, { counterparts: 1, linksPerCounterpart: 1 })
    const answer = await capped.substitutesFor('TM-HD-2000', { page: 1, pageSize: 10 })
    expect(answer.capped).toBe(true)
    const full = (await counter.get('/api/parts/TM-HD-2000/substitutes')).body
    expect(answer.total).toBeLessThan(full.total)
  })

  it('answers an unknown part with 404 and a bad page size with a 400 naming it', async () => {
    expect((await counter.get('/api/parts/TM-XX-0000/substitutes')).status).toBe(404)
    expectBadRequest(await counter.get('/api/parts/TM-HD-1810/substitutes?pageSize=500'), 'pageSize')
  })
})
