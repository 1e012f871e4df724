import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { jobNumber } from '../../shared/quote-job-number'
import { createTestApp, type TestApp } from '../helpers/test-app'

type Agent = Awaited<ReturnType<TestApp['signIn']>>
type Summary = { id: number; customer: string; createdAt: string; vehicle: { make: string | null; model: string | null } }
type Page = { items: Summary[]; total: number; page: number; pageSize: number }

let t: TestApp
let counter: Agent
const made = new Map<string, Summary>()
/** The demo maker's 1994 VIN (worked by hand in vehicles.test.ts). */
const VIN = 'TMWVL3414R1234567'

async function list(query: string): Promise<Page> {
  const response = await counter.get(`/api/quotes?${query}`)
  expect(response.status, JSON.stringify(response.body)).toBe(200)
  return response.body as Page
}

beforeAll(async () => {
  t = await createTestApp()
  const tech = await t.signIn('tech')
  counter = await t.signIn('counter')
  const vell = ((await tech.get('/api/vehicles?year=1993&make=Talmark&model=Vell')).body as { id: number }[])[0]!
  const bodies: Record<string, Record<string, unknown>> = {
    'Ada Brook': { slots: { block: 'TM-BL-1800' } },
    'Ben Carter, 100% paid': { slots: { block: 'TM-BL-1800' }, vin: VIN },
    'Cleo Dunn': { slots: { block: 'TM-BL-2000' }, vehicleId: vell.id },
  }
  for (const [customer, body] of Object.entries(bodies)) {
    const response = await tech.post('/api/quotes').send({ ...body, customer })
    expect(response.status, JSON.stringify(response.body)).toBe(201)
    made.set(customer, response.body as Summary)
  }
  // Five more for paging, all found by one word.
  for (let n = 1; n <= 5; n++) await tech.post('/api/quotes').send({ slots: { block: 'TM-BL-1800' }, customer: `Pager ${n}` })
})
afterAll(() => t.close())

const customers = (page: Page) => page.items.map((item) => item.customer)

describe('GET /api/quotes, searching', () => {
  it('finds quotes by a part of the customer, in any case', async () => {
    expect(customers(await list('q=BROOK'))).toEqual(['Ada Brook'])
  })

  it('finds quotes by a part of the VIN, and by the make or model of their vehicle', async () => {
    expect(customers(await list('q=r12345'))).toEqual(['Ben Carter, 100% paid'])
    const byModel = await list('q=vell')
    expect(customers(byModel)).toEqual(['Cleo Dunn'])
    expect(byModel.items[0]!.vehicle).toMatchObject({ make: 'Talmark', model: 'Vell' })
  })

  it('finds a quote by its job number as printed, or by the number alone', async () => {
    const quote = made.get('Cleo Dunn')!
    const printed = jobNumber(quote)
    expect(customers(await list(`q=${printed}`))).toEqual(['Cleo Dunn'])
    expect((await list(`q=${quote.id}`)).items.map((item) => item.id)).toContain(quote.id)
  })

  it('takes % and _ as the characters they are, not as wildcards', async () => {
    expect(customers(await list(`q=${encodeURIComponent('100%')}`))).toEqual(['Ben Carter, 100% paid'])
    expect((await list('q=_')).total).toBe(0)
  })
})

describe('GET /api/quotes, paging', () => {
  it('answers one page at a time, newest first, with the total found', async () => {
    const first = await list('q=pager&pageSize=2')
    const second = await list('q=pager&pageSize=2&page=2')
    const last = await list('q=pager&pageSize=2&page=3')
    expect(first).toMatchObject({ total: 5, page: 1, pageSize: 2 })
    expect([...customers(first), ...customers(second), ...customers(last)]).toEqual(['Pager 5', 'Pager 4', 'Pager 3', 'Pager 2', 'Pager 1'])
    expect((await list('q=pager&pageSize=2&page=4')).items).toEqual([])
  })

  it('without a search pages through every quote', async () => {
    const all = await list('pageSize=100')
    expect(all.total).toBeGreaterThanOrEqual(8)
    expect(all.items).toHaveLength(all.total)
    expect(all.items.map((item) => item.id)).toEqual([...all.items.map((item) => item.id)].sort((a, b) => b - a))
  })

  it.each([
    ['page=0', 'page'],
    ['page=two', 'page'],
    ['pageSize=500', 'pageSize'],
    ['pageSize=0', 'pageSize'],
    [`q=${'x'.repeat(101)}`, 'q'],
  ])('refuses %s with a 400 naming %s', async (query, field) => {
    const response = await counter.get(`/api/quotes?${query}`)
    expect(response.status).toBe(400)
    expect(response.body.error.details).toEqual([expect.objectContaining({ path: field })])
  })
})
