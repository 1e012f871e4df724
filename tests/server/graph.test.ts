import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { MAX_NEIGHBOURHOOD_EDGES, MAX_NEIGHBOURHOOD_NODES } from '../../shared/schemas/graph'
import { databaseOf } from '../../server/db/sqlite-connection'
import { insertLinkRow } from '../../server/fitment/link-rows'
import { insertPartRows } from '../../server/catalogue/part-writer'
import { expectBadRequest } from '../helpers/expect-error'
import { createTestApp, type TestApp } from '../helpers/test-app'

let t: TestApp
let agent: Awaited<ReturnType<TestApp['signIn']>>
beforeAll(async () => {
  t = await createTestApp()
  agent = await t.signIn('counter')
})
afterAll(() => t.close())

describe('GET /api/graph/path', () => {
  it('finds the chain through an adapter when the direct fit is ruled out', async () => {
    const response = await agent.get('/api/graph/path?from=TM-DS-2005&to=TM-HD-1800')
    expect(response.status).toBe(200)
    expect(response.body.found).toBe(true)
    expect(response.body.nodes.map((n: { id: string }) => n.id)).toEqual(['TM-DS-2005', 'TM-XA-0203', 'TM-HD-1800'])
    expect(response.body.edges.every((e: { relation: string }) => e.relation === 'fits')).toBe(true)
  })

  it('walks through identical part numbers at no cost', async () => {
    const response = await agent.get('/api/graph/path?from=TM-HD-2000&to=TM-BL-2001')
    expect(response.body.edges.map((e: { type: string }) => e.type)).toEqual(['link', 'identity'])
    expect(response.body.message).toContain('1 fit link')
  })

  it('says so when no chain of reviewed fit links exists', async () => {
    const response = await agent.get('/api/graph/path?from=TM-EM-9001&to=TM-HD-2000')
    expect(response.body).toMatchObject({ found: false, edges: [] })
    expect(response.body.message).toMatch(/No chain/)
  })

  it('answers 400 naming the parameter for a missing or unknown part', async () => {
    const missing = await agent.get('/api/graph/path?from=TM-HD-2000')
    expectBadRequest(missing, 'to')
    const unknown = await agent.get('/api/graph/path?from=TM-HD-2000&to=NOPE')
    expectBadRequest(unknown, 'to')
  })
})

describe('GET /api/graph/neighbourhood/:partNumber', () => {
  it('gives nodes and edges ready for drawing, one step out', async () => {
    const response = await agent.get('/api/graph/neighbourhood/TM-HD-1800?depth=1')
    expect(response.status).toBe(200)
    const ids = response.body.nodes.map((n: { id: string }) => n.id)
    expect(ids).toContain('TM-BL-2000')
    expect(ids).toContain('TM-XA-0203')
    for (const edge of response.body.edges) {
      expect(ids).toContain(edge.source)
      expect(ids).toContain(edge.target)
    }
    expect(response.body.nodes.every((n: { distance: number }) => n.distance <= 1)).toBe(true)
    expect(response.body.capped).toBe(false)
  })

  it('reaches further with depth 2', async () => {
    const one = await agent.get('/api/graph/neighbourhood/TM-HD-1800?depth=1')
    const two = await agent.get('/api/graph/neighbourhood/TM-HD-1800?depth=2')
    expect(two.body.nodes.length).toBeGreaterThan(one.body.nodes.length)
    expect(two.body.nodes.map((n: { id: string }) => n.id)).toContain('TM-BL-2001') // identical to TM-BL-2000
  })

  it('refuses other depths with 400', async () => {
    const response = await agent.get('/api/graph/neighbourhood/TM-HD-1800?depth=5')
    expectBadRequest(response, 'depth')
  })

  it('caps a very large neighbourhood and says it did', async () => {
    // Written behind the API, then reported to the graph index as every writer does.
    const own = await createTestApp()
    const hubNumber = 'TEST-HUB'
    const written = await databaseOf(own.dataSource)
      .transaction(async (db) => {
        const spokes = Array.from({ length: MAX_NEIGHBOURHOOD_NODES + 50 }, (_, i) => ({
          partNumber: `TEST-SPOKE-${i}`,
          kind: 'other' as const,
          name: 'Spoke',
          family: '',
          yearFrom: null,
          yearTo: null,
          notes: '',
          attributes: {},
          marks: [],
          listPriceCents: null,
        }))
        return { spokes, ids: await insertPartRows(db, [{ ...spokes[0]!, partNumber: hubNumber }, ...spokes], null, new Date()) }
      })
      .then(({ spokes, ids }) =>
        databaseOf(own.dataSource).transaction(async (db) => {
          const hub = ids.get(hubNumber)!
          const links: number[] = []
          for (const spoke of spokes) {
            const partIds: [number, number] = [hub, ids.get(spoke.partNumber)!]
            links.push(
              await insertLinkRow(db, {
                partIds,
                relation: 'fits',
                modifications: [],
                note: '',
                source: 'editor',
                status: 'approved',
                batchId: null,
              }),
            )
          }
          return { parts: [...ids.values()], links }
        }),
      )
    await own.services.graphIndex.applyChanges(written)
    const counter = await own.signIn('counter')
    const response = await counter.get(`/api/graph/neighbourhood/${hubNumber}?depth=2`)
    await own.close()
    expect(response.body.capped).toBe(true)
    expect(response.body.nodes.length).toBeLessThanOrEqual(MAX_NEIGHBOURHOOD_NODES)
    expect(response.body.edges.length).toBeLessThanOrEqual(MAX_NEIGHBOURHOOD_EDGES)
    expect(response.body.message).toMatch(/larger/)
  })
})
