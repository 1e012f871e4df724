import { afterEach, beforeEach, describe, expect, it } from 'vitest'
import { createTestApp, type TestApp } from '../helpers/test-app'

let t: TestApp
let counter: Awaited<ReturnType<TestApp['signIn']>>
beforeEach(async () => {
  t = await createTestApp()
  counter = await t.signIn('counter')
})
afterEach(() => t.close())

const unitLabelled = async (label: string) => (await counter.get(`/api/stock/label/${label}`)).body as { id: number }

describe('PATCH /api/stock/:id', () => {
  it('changes only the fields sent: selling a used unit keeps its shelf, grade and damage notes', async () => {
    const { id } = await unitLabelled('HY-B-0441')
    await counter.patch(`/api/stock/${id}`).send({ damageNotes: 'Light corrosion on the water jacket.' })
    const sold = await counter.patch(`/api/stock/${id}`).send({ status: 'sold' })
    expect(sold.status).toBe(200)
    expect(sold.body).toMatchObject({
      status: 'sold',
      location: 'Rack H4',
      grade: 'B',
      damageNotes: 'Light corrosion on the water jacket.',
      priceCents: 12500,
    })
  })

  it('moves a unit to another site and shelf, and what-fits names the new site at once', async () => {
    const { id } = await unitLabelled('HY-B-0441')
    const moved = await counter.patch(`/api/stock/${id}`).send({ site: 'Northgate counter', location: 'Aisle 1, shelf 4' })
    expect(moved.status).toBe(200)
    expect(moved.body).toMatchObject({ site: { name: 'Northgate counter' }, location: 'Aisle 1, shelf 4', grade: 'B', status: 'available' })
    const fits = (await counter.get('/api/parts/TM-BL-1800/fits?pageSize=200&kind=head')).body as {
      groups: { results: { part: { partNumber: string }; stock: { sites: string[] } }[] }[]
    }
    const head = fits.groups.flatMap((group) => group.results).find((fit) => fit.part.partNumber === 'TM-HD-1800')
    expect(head?.stock.sites).toEqual(['Northgate counter'])
  })
})

describe('POST /api/stock, the donor VIN', () => {
  const unit = { partNumber: 'TM-HD-1800', site: 'Hollin yard, lot B', condition: 'used', grade: 'B', priceCents: 9000 }

  it('takes a donor VIN whose check digit agrees', async () => {
    const created = await counter.post('/api/stock').send({ ...unit, donorVin: '1zzaa11axs1000000' })
    expect(created.status, JSON.stringify(created.body)).toBe(201)
    expect(created.body.donorVin).toBe('1ZZAA11AXS1000000')
  })

  it.each([
    // X is the check digit of 1ZZAA11A?S1000000 by the 49 CFR 565.15 weights; a 5 there cannot be right.
    ['a check digit that does not agree', '1ZZAA11A5S1000000', 'Check digit (position 9) is 5'],
    ['a letter a VIN never holds', '1ZZAA11AXS100000O', 'never contains O'],
    ['too few characters', '1ZZAA11AXS10000', 'has 15'],
  ])('refuses %s, naming the donor VIN, and adds nothing', async (_what, donorVin, message) => {
    const before = (await counter.get('/api/stock?pageSize=200&status=available')).body.total as number
    const refused = await counter.post('/api/stock').send({ ...unit, donorVin })
    expect(refused.status).toBe(400)
    expect(refused.body.error.details).toContainEqual({ path: 'donorVin', message: expect.stringContaining(message) })
    expect((await counter.get('/api/stock?pageSize=200&status=available')).body.total).toBe(before)
  })
})
