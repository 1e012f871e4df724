import { afterEach, beforeEach, describe, expect, it } from 'vitest'
import { createTestApp, type TestApp } from '../helpers/test-app'

let t: TestApp
let counter: Awaited<ReturnType<TestApp['signIn']>>
beforeEach(async () => {
  t = await createTestApp()
  counter = await t.signIn('counter')
})
afterEach(() => t.close())

type Fit = {
  part: { partNumber: string }
  stock: { available: number; bestCondition: string | null; minPriceCents: number | null; maxPriceCents: number | null; sites: string[] }
}
const fits = async (part: string, query = '') =>
  ((await counter.get(`/api/parts/${part}/fits?pageSize=200${query}`)).body as { groups: { results: Fit[] }[] }).groups.flatMap(
    (g) => g.results,
  )

describe('stock on the shelf', () => {
  it('lists the demo sites and units by part, site and status', async () => {
    const sites = (await counter.get('/api/sites')).body as { name: string }[]
    expect(sites.map((site) => site.name)).toEqual(['Hollin yard, lot B', 'Northgate counter'])
    const heads = (await counter.get('/api/stock?part=TM-HD-1810')).body
    expect(heads.total).toBe(2)
    expect(heads.items.map((item: { condition: string }) => item.condition).sort()).toEqual(['core', 'used'])
    const sold = (await counter.get('/api/stock?status=sold')).body
    expect(sold.items.map((item: { label: string }) => item.label)).toEqual(['HY-B-0451'])
    expect((await counter.get('/api/stock/label/NG-000113')).body).toMatchObject({
      partNumber: 'TM-HD-2000R',
      site: { name: 'Northgate counter' },
    })
    expect((await counter.get('/api/stock/label/NOPE')).status).toBe(404)
  })

  it('shows on what-fits lines how many are available, the best condition, the price range and where', async () => {
    const heads = await fits('TM-BL-1800', '&kind=head')
    const byNumber = new Map(heads.map((fit) => [fit.part.partNumber, fit.stock]))
    // Available units only: the core counts (it is on the shelf), never a reserved or sold one.
    expect(byNumber.get('TM-HD-1810')).toEqual({
      available: 2,
      bestCondition: 'used',
      minPriceCents: 2500,
      maxPriceCents: 17500,
      sites: ['Hollin yard, lot B'],
      nearestSite: 'Hollin yard, lot B',
    })
    expect(byNumber.get('TM-HD-2000')).toMatchObject({ available: 1, bestCondition: 'new', sites: ['Northgate counter'] })
    const blocks = await fits('TM-HD-2000', '&kind=block')
    expect(blocks.find((fit) => fit.part.partNumber === 'TM-BL-2000')?.stock.available).toBe(0)
  })

  it('keeps only parts in stock when asked, and follows a unit being sold at once', async () => {
    const inStock = await fits('TM-BL-1800', '&kind=head&inStock=1')
    // Every head on a shelf that fits the block; TM-HD-2050 fits too but none is in stock.
    expect(inStock.map((fit) => fit.part.partNumber).sort()).toEqual(['TM-HD-1800', 'TM-HD-1810', 'TM-HD-2000', 'TM-HD-2000R'])
    expect((await fits('TM-BL-1800', '&kind=head')).map((fit) => fit.part.partNumber)).toContain('TM-HD-2050')
    const unit = (await counter.get('/api/stock/label/NG-000112')).body as { id: number }
    const sold = await counter.patch(`/api/stock/${unit.id}`).send({ status: 'sold' })
    expect(sold.status).toBe(200)
    const after = await fits('TM-BL-1800', '&kind=head&inStock=1')
    expect(after.map((fit) => fit.part.partNumber)).not.toContain('TM-HD-2000')
  })

  it('adds a unit and a site, and refuses bad input with the field named', async () => {
    const editor = await t.signIn('editor')
    expect((await editor.post('/api/sites').send({ name: 'Southgate counter' })).status).toBe(201)
    expect((await editor.post('/api/sites').send({ name: 'Southgate counter' })).status).toBe(409)
    expect((await counter.post('/api/sites').send({ name: 'Counter site' })).status).toBe(403)
    const unit = { partNumber: 'TM-BL-1800', site: 'Southgate counter', condition: 'new', priceCents: 120000, label: 'SG-1' }
    const created = await counter.post('/api/stock').send(unit)
    expect(created.status, JSON.stringify(created.body)).toBe(201)
    expect(created.body).toMatchObject({ partNumber: 'TM-BL-1800', status: 'available', site: { name: 'Southgate counter' } })
    expect((await counter.post('/api/stock').send(unit)).status).toBe(409)
    const problems: [Record<string, unknown>, string][] = [
      [{ ...unit, label: null, priceCents: -5 }, 'priceCents'],
      [{ ...unit, label: null, priceCents: 12.5 }, 'priceCents'],
      [{ ...unit, label: null, site: 'Nowhere' }, 'site'],
      [{ ...unit, label: null, partNumber: 'TM-NOPE' }, 'partNumber'],
      [{ ...unit, label: null, grade: 'A' }, 'grade'],
      [{ ...unit, label: null, status: 'lost' }, 'status'],
    ]
    for (const [body, path] of problems) {
      const response = await counter.post('/api/stock').send(body)
      expect(response.status, path).toBe(400)
      expect(response.body.error.details.map((d: { path: string }) => d.path)).toContain(path)
    }
    expect((await counter.get('/api/stock?site=Southgate counter')).body.total).toBe(1)
    const tech = await t.signIn('tech')
    expect((await tech.post('/api/stock').send({ ...unit, label: 'SG-2' })).status).toBe(403)
  })
})
