import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { createTestApp, type TestApp } from '../helpers/test-app'

let t: TestApp
let tech: Awaited<ReturnType<TestApp['signIn']>>
beforeAll(async () => {
  t = await createTestApp()
  tech = await t.signIn('tech')
})
afterAll(() => t.close())

type Availability = {
  available: number
  bestCondition: string | null
  minPriceCents: number | null
  maxPriceCents: number | null
  sites: string[]
}
type Candidate = { part: { partNumber: string }; stock: Availability }
type ShelfUnit = { stockItemId: number; site: string; location: string; condition: string; priceCents: number }
type Line = { partNumber?: string; category: string; quantity: number; shelf?: { take: ShelfUnit[]; toOrder: number } }

async function headCandidates(): Promise<Candidate[]> {
  const response = await tech.post('/api/builds/complete').send({ slots: { block: 'TM-BL-1800' }, only: ['head'], limit: 50 })
  expect(response.status, JSON.stringify(response.body)).toBe(200)
  return (response.body as { slots: Record<string, { candidates: Candidate[] }> }).slots['head']!.candidates
}

async function partsList(slots: Record<string, string>): Promise<Line[]> {
  const response = await tech.post('/api/builds/evaluate').send({ slots })
  expect(response.status, JSON.stringify(response.body)).toBe(200)
  return (response.body as { partsList: Line[] }).partsList
}

describe('stock in the planner', () => {
  it('gives each slot suggestion the demo shelf: count, best condition, price range and sites', async () => {
    const candidates = await headCandidates()
    const byNumber = new Map(candidates.map((candidate) => [candidate.part.partNumber, candidate.stock]))
    // The demo has a used grade-A unit (175.00) and a core (25.00) of this head, both in the yard.
    expect(byNumber.get('TM-HD-1810')).toEqual({
      available: 2,
      bestCondition: 'used',
      minPriceCents: 2500,
      maxPriceCents: 17500,
      sites: ['Hollin yard, lot B'],
      nearestSite: 'Hollin yard, lot B',
    })
    expect(byNumber.get('TM-HD-1800')).toMatchObject({ available: 1, bestCondition: 'used', minPriceCents: 12500, maxPriceCents: 12500 })
    const withoutStock = candidates.filter(
      (candidate) => !['TM-HD-1810', 'TM-HD-1800', 'TM-HD-2000', 'TM-HD-2000R'].includes(candidate.part.partNumber),
    )
    expect(withoutStock.length).toBeGreaterThan(0)
    for (const candidate of withoutStock) expect(candidate.stock).toMatchObject({ available: 0, bestCondition: null, sites: [] })
  })

  it('names on each parts-list line the unit to take, the best condition first, or what is left to order', async () => {
    const lines = await partsList({ block: 'TM-BL-1800', head: 'TM-HD-1810', 'head-gasket': 'TM-HG-1800' })
    const head = lines.find((line) => line.partNumber === 'TM-HD-1810')!
    // The used unit before the core, though the core is cheaper.
    expect(head.shelf).toEqual({
      take: [{ stockItemId: expect.any(Number), site: 'Hollin yard, lot B', location: 'Rack H4', condition: 'used', priceCents: 17500 }],
      toOrder: 0,
    })
    const block = lines.find((line) => line.partNumber === 'TM-BL-1800')!
    expect(block.shelf?.take).toEqual([expect.objectContaining({ location: 'Floor, bay 2', condition: 'used', priceCents: 9000 })])
    const gasket = lines.find((line) => line.partNumber === 'TM-HG-1800')!
    expect(gasket.shelf).toEqual({ take: [], toOrder: gasket.quantity })
    for (const line of lines.filter((l) => !l.partNumber)) expect(line.shelf).toBeUndefined()
  })

  it('never takes a reserved or sold unit: such a part is to order', async () => {
    // The demo's two blocks TM-BL-2000 are one reserved and one sold.
    const lines = await partsList({ block: 'TM-BL-2000' })
    expect(lines.find((line) => line.partNumber === 'TM-BL-2000')!.shelf).toEqual({ take: [], toOrder: 1 })
  })

  it('follows the shelf: once the counter sells the only block, the suggestions and the parts list say so', async () => {
    // A fresh app: this test writes to the shelf.
    const own = await createTestApp()
    try {
      const ownTech = await own.signIn('tech')
      const blockStock = async () => {
        const complete = await ownTech.post('/api/builds/complete').send({ slots: { head: 'TM-HD-1810' }, only: ['block'], limit: 50 })
        const blocks = (complete.body as { slots: Record<string, { candidates: Candidate[] }> }).slots['block']!.candidates
        return blocks.find((candidate) => candidate.part.partNumber === 'TM-BL-1800')!.stock.available
      }
      expect(await blockStock()).toBe(1)
      const counter = await own.signIn('counter')
      const units = await counter.get('/api/stock').query({ part: 'TM-BL-1800', status: 'available' })
      const unit = (units.body as { items: { id: number }[] }).items[0]!
      const sold = await counter.patch(`/api/stock/${unit.id}`).send({ status: 'sold' })
      expect(sold.status, JSON.stringify(sold.body)).toBe(200)

      expect(await blockStock()).toBe(0)
      const evaluated = await ownTech.post('/api/builds/evaluate').send({ slots: { block: 'TM-BL-1800' } })
      const block = (evaluated.body as { partsList: Line[] }).partsList.find((line) => line.partNumber === 'TM-BL-1800')!
      expect(block.shelf).toEqual({ take: [], toOrder: 1 })

      // With the used head sold, only its core is left: a core is for exchange, so the head is to order.
      const heads = await counter.get('/api/stock').query({ part: 'TM-HD-1810', status: 'available' })
      const used = (heads.body as { items: { id: number; condition: string }[] }).items.find((item) => item.condition === 'used')!
      expect((await counter.patch(`/api/stock/${used.id}`).send({ status: 'sold' })).status).toBe(200)
      const withCore = await ownTech.post('/api/builds/evaluate').send({ slots: { head: 'TM-HD-1810' } })
      const head = (withCore.body as { partsList: Line[] }).partsList.find((line) => line.partNumber === 'TM-HD-1810')!
      expect(head.shelf).toEqual({ take: [], toOrder: 1 })
    } finally {
      await own.close()
    }
  })
})
