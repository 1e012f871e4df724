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

type Result = {
  part: { partNumber: string; kind: string }
  relation: string
  decidedBy: string
  review: string
  ruleIds: string[]
  modifications: { name: string; steps: string[] }[]
  explanation: { type: string; text: string }[]
}
type Group = { kind: string; relation: string; source: 'reviewed' | 'inferred'; total: number; offset: number; results: Result[] }
const byNumber = (results: Result[], number: string) => results.find((r) => r.part.partNumber === number)
const resultsOf = (body: { groups: Group[] }): Result[] => body.groups.flatMap((group) => group.results)

describe('GET /api/parts/:partNumber/fits', () => {
  it('lists the reviewed links of a head with their modifications and explanation', async () => {
    const response = await agent.get('/api/parts/TM-HD-2000/fits')
    expect(response.status).toBe(200)
    const swap = byNumber(resultsOf(response.body), 'TM-BL-1800')!
    expect(swap).toMatchObject({ relation: 'fits-with-modification', decidedBy: 'link', review: 'approved' })
    expect(swap.modifications.map((m) => m.name)).toEqual(['oil-restrictor-fit'])
    expect(swap.modifications[0]!.steps.length).toBeGreaterThan(0)
    expect(swap.explanation[0]).toMatchObject({ type: 'link' })
  })

  it('carries a link over to every part identical to its end, saying so in the explanation', async () => {
    const response = await agent.get('/api/parts/TM-BL-2001/fits')
    expect(response.body.identical.map((p: { partNumber: string }) => p.partNumber)).toEqual(['TM-BL-2000'])
    const head = byNumber(resultsOf(response.body), 'TM-HD-2000')!
    expect(head.relation).toBe('fits')
    expect(head.explanation.map((step) => step.type)).toEqual(['identity', 'link'])
    expect(head.explanation[0]!.text).toContain('TM-BL-2001 is the same part as TM-BL-2000')
  })

  it('answers rule-inferred fits in their own groups, after the reviewed group of the same kind and relation, naming the rule', async () => {
    const response = await agent.get('/api/parts/TM-HD-2000/fits')
    const groups = response.body.groups as Group[]
    expect(groups.some((group) => group.source === 'inferred')).toBe(true)
    for (const group of groups) {
      const reviews = new Set(group.results.map((r) => r.review))
      if (group.source === 'inferred') expect([...reviews]).toEqual(['inferred'])
      else expect(reviews.has('inferred')).toBe(false)
      const reviewedTwin = groups.findIndex(
        (other) => other.kind === group.kind && other.relation === group.relation && other.source === 'reviewed',
      )
      if (group.source === 'inferred' && reviewedTwin >= 0) expect(reviewedTwin).toBeLessThan(groups.indexOf(group))
    }
    const gear = byNumber(resultsOf(response.body), 'TM-CG-1800')!
    expect(gear).toMatchObject({ relation: 'does-not-fit', decidedBy: 'rule', ruleIds: ['shaft-fits'] })
    const distributor = byNumber(resultsOf(response.body), 'TM-DS-1810')!
    expect(distributor.relation).toBe('fits-with-modification')
    expect(distributor.modifications.map((m) => m.name)).toEqual(['distributor-internals-transfer'])
  })

  it('infers a belt against a gear from tooth profile, pitch and width (ISO 9010 interchange)', async () => {
    const response = await agent.get('/api/parts/TM-CG-2000/fits?kind=timing-belt')
    const relations = Object.fromEntries(resultsOf(response.body).map((r) => [r.part.partNumber, r.relation]))
    expect(relations['TM-TB-2000']).toBe('fits')
    expect(relations['TM-TB-2022']).toBe('does-not-fit') // 22 mm belt on a 25 mm gear
    expect(relations['TM-TB-1800']).toBe('does-not-fit') // trapezoidal 9.525 mm pitch
    expect(byNumber(resultsOf(response.body), 'TM-TB-2090')).toMatchObject({
      relation: 'fits',
      decidedBy: 'rule',
      ruleIds: ['timing-drive'],
    })
  })

  it('infers a head gasket against a cylinder bore', async () => {
    const response = await agent.get('/api/parts/TM-BL-2000/fits?kind=head-gasket')
    const relations = Object.fromEntries(resultsOf(response.body).map((r) => [r.part.partNumber, r.relation]))
    expect(relations['TM-HG-1800']).toBe('does-not-fit') // 84.5 mm gasket bore, 86 mm cylinders
    expect(relations['TM-HG-2000']).toBe('fits')
  })

  it('shows proposed links as proposed', async () => {
    const response = await agent.get('/api/parts/TM-HD-2050/fits?kind=exhaust-manifold')
    const header = byNumber(resultsOf(response.body), 'TM-EM-2000H')!
    expect(header).toMatchObject({ review: 'proposed', decidedBy: 'link' })
    expect(header.explanation[0]!.text).toContain('not yet reviewed')
  })

  it('filters by relation and kind', async () => {
    const response = await agent.get('/api/parts/TM-HD-2000/fits?relation=does-not-fit&kind=intake-manifold')
    expect(resultsOf(response.body).length).toBeGreaterThan(0)
    for (const result of resultsOf(response.body) as Result[]) {
      expect(result.relation).toBe('does-not-fit')
      expect(result.part.kind).toBe('intake-manifold')
    }
  })

  it('leaves inferred fits out on request', async () => {
    const response = await agent.get('/api/parts/TM-HD-2000/fits?inferred=0')
    expect(resultsOf(response.body).every((r) => r.review !== 'inferred')).toBe(true)
  })

  it('pages inferred results within each kind and relation and says how many there are', async () => {
    const first = await agent.get('/api/parts/TM-HD-2000/fits?kind=head-gasket&relation=fits&pageSize=2')
    const inferred = (first.body.groups as Group[]).find((group) => group.source === 'inferred')!
    expect(inferred).toMatchObject({ kind: 'head-gasket', relation: 'fits', total: 4, offset: 0 })
    expect(inferred.results).toHaveLength(2)
    const second = await agent.get('/api/parts/TM-HD-2000/fits?kind=head-gasket&relation=fits&pageSize=2&page=2')
    const next = (second.body.groups as Group[]).find((group) => group.source === 'inferred')!
    expect(next).toMatchObject({ total: 4, offset: 2 })
    const shown = [...inferred.results, ...next.results].map((r) => r.part.partNumber)
    expect(new Set(shown).size).toBe(4)
    expect(shown).toEqual([...shown].sort())
  })

  it('answers 400 with a short message for a page or page size out of bounds', async () => {
    expectBadRequest(await agent.get('/api/parts/TM-HD-2000/fits?page=0'), 'page')
    expectBadRequest(await agent.get('/api/parts/TM-HD-2000/fits?pageSize=1000'), 'pageSize')
    expectBadRequest(await agent.get('/api/parts/TM-HD-2000/fits?page=two'), 'page')
  })

  it('opens a part from its casting mark', async () => {
    const response = await agent.get('/api/parts/H18-2207/fits')
    expect(response.body.part.partNumber).toBe('TM-HD-1800')
  })

  it('answers 404 for an unknown part and 400 for an unknown relation', async () => {
    expect((await agent.get('/api/parts/NOPE-1/fits')).status).toBe(404)
    const bad = await agent.get('/api/parts/TM-HD-2000/fits?relation=maybe')
    expectBadRequest(bad, 'relation')
  })
})
