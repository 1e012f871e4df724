import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { expectBadRequest } from '../helpers/expect-error'
import { createTestApp, type TestApp } from '../helpers/test-app'

let t: TestApp
let agent: Awaited<ReturnType<TestApp['signIn']>>
beforeAll(async () => {
  t = await createTestApp()
  agent = await t.signIn('counter')
})
afterAll(() => t.close())

describe('GET /api/parts', () => {
  it('pages through the whole demo catalogue with a total', async () => {
    const first = await agent.get('/api/parts?pageSize=25&page=1')
    expect(first.status).toBe(200)
    expect(first.body.total).toBeGreaterThanOrEqual(60)
    expect(first.body.items).toHaveLength(25)
    const last = Math.ceil(first.body.total / 25)
    const tail = await agent.get(`/api/parts?pageSize=25&page=${last}`)
    expect(tail.body.items.length).toBe(first.body.total - 25 * (last - 1))
    const numbers = new Set<string>()
    for (let page = 1; page <= last; page++) {
      const response = await agent.get(`/api/parts?pageSize=25&page=${page}`)
      for (const item of response.body.items) numbers.add(item.partNumber)
    }
    expect(numbers.size).toBe(first.body.total)
  })

  it('has demo parts of every kind', async () => {
    const kinds = [
      'block',
      'head',
      'head-gasket',
      'head-bolt',
      'distributor',
      'ignition-leads',
      'ecu',
      'harness',
      'intake-manifold',
      'intake-gasket',
      'exhaust-manifold',
      'exhaust-gasket',
      'fuel-rail',
      'injector',
      'cam-gear',
      'timing-belt',
      'crank-pulley',
      'oil-restrictor',
      'other',
    ]
    for (const kind of kinds) {
      const response = await agent.get(`/api/parts?kind=${kind}`)
      expect(response.body.total, kind).toBeGreaterThan(0)
      expect(response.body.items.every((item: { kind: string }) => item.kind === kind)).toBe(true)
    }
  })

  it('finds a part by its number typed without dashes and in lower case, exact match first', async () => {
    const response = await agent.get('/api/parts?q=tmhd2000')
    expect(response.body.items[0].partNumber).toBe('TM-HD-2000')
    expect(response.body.items.map((item: { partNumber: string }) => item.partNumber)).toContain('TM-HD-2000R')
  })

  it('finds a part by a casting mark, a stamped code and a superseded number', async () => {
    const byCasting = await agent.get('/api/parts?q=H18-2207B')
    expect(byCasting.body.items[0].partNumber).toBe('TM-HD-1810')
    const bySuperseded = await agent.get('/api/parts?q=TM-HD-1805')
    expect(bySuperseded.body.items.map((i: { partNumber: string }) => i.partNumber)).toEqual(['TM-HD-1810'])
    const byStamp = await agent.get('/api/parts?q=E20-C')
    expect(byStamp.body.items[0].partNumber).toBe('TM-EC-2096')
  })

  it('finds parts by words of the name and combines search with the kind filter', async () => {
    const response = await agent.get('/api/parts?q=timing belt&kind=timing-belt')
    expect(response.body.total).toBeGreaterThan(0)
    expect(response.body.items.every((i: { kind: string }) => i.kind === 'timing-belt')).toBe(true)
  })

  it('treats LIKE wildcards in the search as plain characters', async () => {
    const response = await agent.get('/api/parts?q=%25')
    expect(response.body.total).toBe(0)
  })

  it('answers 400 naming the field for an unknown kind or a page size over the cap', async () => {
    const badKind = await agent.get('/api/parts?kind=flux-capacitor')
    expectBadRequest(badKind, 'kind')
    const bigPage = await agent.get('/api/parts?pageSize=5000')
    expectBadRequest(bigPage, 'pageSize')
  })
})

describe('GET /api/parts/:partNumber', () => {
  it('answers the part with typed attributes and its marks', async () => {
    const response = await agent.get('/api/parts/TM-BL-2000')
    expect(response.status).toBe(200)
    expect(response.body).toMatchObject({ partNumber: 'TM-BL-2000', kind: 'block', family: 'TK20V', yearFrom: 1992 })
    expect(response.body.attributes).toMatchObject({ boreMm: 86, cylinders: 4, oilRestrictor: true, headBoltThread: 'M11x1.5' })
    expect(response.body.marks).toEqual(
      expect.arrayContaining([
        { type: 'casting', value: 'C20-5521' },
        { type: 'superseded', value: 'TM-BL-1999' },
      ]),
    )
  })

  it('opens a part from its superseded number', async () => {
    const response = await agent.get('/api/parts/TM-BL-1999')
    expect(response.body.partNumber).toBe('TM-BL-2000')
  })

  it('answers 400, not a server error, for a part number that is not valid percent-encoding', async () => {
    const response = await agent.get('/api/parts/%E0%A4%A')
    expect(response.status).toBe(400)
    expect(response.body.error.message).toBeTruthy()
  })

  it('answers 404 with a message for an unknown part', async () => {
    const response = await agent.get('/api/parts/NO-SUCH-PART')
    expect(response.status).toBe(404)
    expect(response.body.error.message).toContain('NO-SUCH-PART')
  })
})
