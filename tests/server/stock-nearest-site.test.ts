import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { createTestApp, type TestApp } from '../helpers/test-app'

type Agent = Awaited<ReturnType<TestApp['signIn']>>
type Availability = { available: number; sites: string[]; nearestSite: string | null }
type Candidate = { part: { partNumber: string }; stock: Availability }
type FitsAnswer = { groups: { results: { part: { partNumber: string }; stock: Availability }[] }[] }
type Line = { partNumber?: string; shelf?: { take: { site: string; condition: string; priceCents: number }[] } }

let t: TestApp
let admin: Agent
let tech: Agent
let techId: number
const siteIds = new Map<string, number>()
/** A head that fits the demo block and has no demo stock: the tests put their own units on the shelf, in order. */
let head: string

async function headCandidates(): Promise<Candidate[]> {
  const response = await tech.post('/api/builds/complete').send({ slots: { block: 'TM-BL-1800' }, only: ['head'], limit: 50 })
  expect(response.status, JSON.stringify(response.body)).toBe(200)
  return (response.body as { slots: Record<string, { candidates: Candidate[] }> }).slots['head']!.candidates
}

async function stockOf(partNumber: string): Promise<Availability> {
  return (await headCandidates()).find((candidate) => candidate.part.partNumber === partNumber)!.stock
}

async function takenFor(partNumber: string) {
  const response = await tech.post('/api/builds/evaluate').send({ slots: { block: 'TM-BL-1800', head: partNumber } })
  expect(response.status, JSON.stringify(response.body)).toBe(200)
  return (response.body as { partsList: Line[] }).partsList.find((line) => line.partNumber === partNumber)!.shelf!.take
}

async function setHome(site: string | null) {
  const response = await tech.put('/api/account/home-site').send({ homeSiteId: site === null ? null : siteIds.get(site)! })
  expect(response.status, JSON.stringify(response.body)).toBe(200)
}

async function addUnit(partNumber: string, site: string, condition: string, priceCents: number) {
  const response = await admin.post('/api/stock').send({ partNumber, site, condition, priceCents })
  expect(response.status, JSON.stringify(response.body)).toBe(201)
}

beforeAll(async () => {
  t = await createTestApp()
  admin = await t.signIn('admin')
  tech = await t.signIn('tech')
  techId = ((await tech.get('/api/auth/me')).body as { id: number }).id
  for (const name of ['Zed lot', 'Able lot', 'Mid lot', 'Empty lot']) {
    const response = await admin.post('/api/sites').send({ name })
    expect(response.status, JSON.stringify(response.body)).toBe(201)
    siteIds.set(name, (response.body as { id: number }).id)
  }
  head = (await headCandidates()).find((candidate) => candidate.stock.available === 0)!.part.partNumber
  // Zed holds the most of `head`; each lot holds one used unit at its own price.
  await addUnit(head, 'Zed lot', 'used', 10_000)
  await addUnit(head, 'Zed lot', 'used', 11_000)
  await addUnit(head, 'Able lot', 'used', 12_000)
  await addUnit(head, 'Mid lot', 'used', 15_000)
})
afterAll(() => t.close())

describe('the nearest site of a part', () => {
  it('without a home site is the site with the most available units, listed first, the others by name', async () => {
    await setHome(null)
    expect(await stockOf(head)).toMatchObject({ available: 4, nearestSite: 'Zed lot', sites: ['Zed lot', 'Able lot', 'Mid lot'] })
  })

  it('is the home site when it holds a unit, even with fewer than another site', async () => {
    await setHome('Mid lot')
    expect(await stockOf(head)).toMatchObject({ nearestSite: 'Mid lot', sites: ['Mid lot', 'Able lot', 'Zed lot'] })
  })

  it('falls back to the site with the most when the home site holds none of the part', async () => {
    await setHome('Empty lot')
    expect(await stockOf(head)).toMatchObject({ nearestSite: 'Zed lot', sites: ['Zed lot', 'Able lot', 'Mid lot'] })
  })

  it('is the same on the what-fits lines as on the slot suggestions', async () => {
    await setHome('Mid lot')
    const response = await tech.get('/api/parts/TM-BL-1800/fits?kind=head&pageSize=100')
    expect(response.status).toBe(200)
    const line = (response.body as FitsAnswer).groups.flatMap((group) => group.results).find((r) => r.part.partNumber === head)
    expect(line?.stock).toMatchObject({ available: 4, nearestSite: 'Mid lot', sites: ['Mid lot', 'Able lot', 'Zed lot'] })
  })

  it('goes to the first name when two sites hold as many', async () => {
    await addUnit(head, 'Able lot', 'used', 12_500)
    await setHome(null)
    expect(await stockOf(head)).toMatchObject({ available: 5, nearestSite: 'Able lot', sites: ['Able lot', 'Mid lot', 'Zed lot'] })
  })
})

describe('the unit to take', () => {
  it('is the cheapest of the best condition without a home site', async () => {
    await setHome(null)
    expect(await takenFor(head)).toEqual([expect.objectContaining({ site: 'Zed lot', priceCents: 10_000 })])
  })

  it('is at the home site among units of the same condition, though dearer', async () => {
    await setHome('Mid lot')
    expect(await takenFor(head)).toEqual([expect.objectContaining({ site: 'Mid lot', priceCents: 15_000 })])
  })

  it('is the one a quote takes too', async () => {
    await setHome('Able lot')
    const response = await tech.post('/api/quotes').send({ slots: { block: 'TM-BL-1800', head } })
    expect(response.status, JSON.stringify(response.body)).toBe(201)
    const lines = (response.body as { lines: { partNumber?: string; site?: string; unitPriceCents: number }[] }).lines
    expect(lines.find((line) => line.partNumber === head)).toMatchObject({ site: 'Able lot', unitPriceCents: 12_000 })
  })

  it('keeps the better condition before the home site', async () => {
    await addUnit(head, 'Zed lot', 'new', 30_000)
    await setHome('Mid lot')
    expect(await takenFor(head)).toEqual([expect.objectContaining({ site: 'Zed lot', condition: 'new' })])
  })
})

describe('choosing a home site', () => {
  it('is the user’s own on the account, and shows on who is signed in', async () => {
    await setHome('Able lot')
    expect((await tech.get('/api/auth/me')).body).toMatchObject({ homeSiteId: siteIds.get('Able lot') })
    await setHome(null)
    expect((await tech.get('/api/auth/me')).body).toMatchObject({ homeSiteId: null })
  })

  it('can be set for anyone by an administrator', async () => {
    const response = await admin.patch(`/api/users/${techId}`).send({ homeSiteId: siteIds.get('Zed lot') })
    expect(response.status, JSON.stringify(response.body)).toBe(200)
    expect(response.body).toMatchObject({ id: techId, homeSiteId: siteIds.get('Zed lot') })
    expect((await tech.get('/api/auth/me')).body).toMatchObject({ homeSiteId: siteIds.get('Zed lot') })
  })

  it('refuses a site that does not exist or a value that is not an id, and keeps the old one', async () => {
    await setHome('Mid lot')
    const missing = await tech.put('/api/account/home-site').send({ homeSiteId: 99_999 })
    expect(missing.status).toBe(400)
    expect(missing.body.error.details).toEqual([expect.objectContaining({ path: 'homeSiteId' })])
    expect((await tech.put('/api/account/home-site').send({ homeSiteId: 'Mid lot' })).status).toBe(400)
    expect((await tech.put('/api/account/home-site').send({})).status).toBe(400)
    expect((await admin.patch(`/api/users/${techId}`).send({ homeSiteId: 99_999 })).status).toBe(400)
    expect((await tech.get('/api/auth/me')).body).toMatchObject({ homeSiteId: siteIds.get('Mid lot') })
  })

  it('is the administrator’s to set for others: a technician cannot', async () => {
    expect((await tech.patch(`/api/users/${techId}`).send({ homeSiteId: null })).status).toBe(403)
  })
})
