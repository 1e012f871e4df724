import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { uploadCsv } from '../helpers/imports'
import { createTestApp, type TestApp } from '../helpers/test-app'

/*
 * A hub part built through the API (a parts import, then one link per spoke),
 * and edits of links and identities that the next answer must show without
 * the fit graph being loaded again.
 */
let t: TestApp
let editor: Awaited<ReturnType<TestApp['signIn']>>
const SPOKES = 47
const spoke = (i: number) => `ZZ-SP-${String(i).padStart(3, '0')}`
const HUB = 'ZZ-HUB-1'

type Result = { part: { partNumber: string }; relation: string; review: string; explanation: { type: string; text: string }[] }
type Group = { kind: string; relation: string; source: string; total: number; offset: number; results: Result[] }
const groupsOf = (body: { groups: Group[] }) => body.groups
const numbersOf = (group: Group | undefined) => group?.results.map((r) => r.part.partNumber) ?? []

beforeAll(async () => {
  t = await createTestApp()
  editor = await t.signIn('editor')
  const rows = [HUB, ...Array.from({ length: SPOKES }, (_, i) => spoke(i)), 'ZZ-ID-A', 'ZZ-ID-B', 'ZZ-ID-C', 'ZZ-ID-X']
  // Spokes written in reverse, so an answer in part-number order is not just insertion order.
  const csv = ['part_number,kind,name,family', ...rows.reverse().map((number) => `${number},other,Test part ${number},TK20V`)].join('\n')
  expect((await uploadCsv(editor, csv, { type: 'parts', mode: 'commit' })).status).toBe(201)
  for (let i = 0; i < SPOKES; i++) {
    const relation = i % 5 === 0 ? 'does-not-fit' : 'fits'
    expect((await editor.post('/api/links').send({ fromPart: HUB, toPart: spoke(i), relation })).status).toBe(201)
  }
})
afterAll(() => t.close())

describe('GET /api/parts/:partNumber/fits on a hub part', () => {
  it('answers every group with its total and the first page of it, in part-number order', async () => {
    const response = await editor.get(`/api/parts/${HUB}/fits?inferred=0`)
    expect(response.status).toBe(200)
    const groups = groupsOf(response.body)
    const fits = groups.find((g) => g.relation === 'fits')!
    const noFit = groups.find((g) => g.relation === 'does-not-fit')!
    expect(fits).toMatchObject({ kind: 'other', source: 'reviewed', total: 37, offset: 0 })
    expect(noFit).toMatchObject({ kind: 'other', source: 'reviewed', total: 10 })
    expect(fits.results).toHaveLength(20)
    expect(noFit.results).toHaveLength(10)
    const expectedFits = Array.from({ length: SPOKES }, (_, i) => i)
      .filter((i) => i % 5 !== 0)
      .map(spoke)
    expect(numbersOf(fits)).toEqual(expectedFits.slice(0, 20))
    expect(response.body).toMatchObject({ page: 1, pageSize: 20 })
  })

  it('pages one group with kind, relation, page and page size, through to an empty page', async () => {
    const expectedFits = Array.from({ length: SPOKES }, (_, i) => i)
      .filter((i) => i % 5 !== 0)
      .map(spoke)
    const seen: string[] = []
    for (let page = 1; page <= 4; page++) {
      const response = await editor.get(`/api/parts/${HUB}/fits?inferred=0&kind=other&relation=fits&page=${page}&pageSize=10`)
      const groups = groupsOf(response.body)
      expect(groups.map((g) => [g.kind, g.relation, g.source])).toEqual([['other', 'fits', 'reviewed']])
      expect(groups[0]).toMatchObject({ total: 37, offset: (page - 1) * 10 })
      seen.push(...numbersOf(groups[0]))
    }
    expect(seen).toEqual(expectedFits)
    const past = await editor.get(`/api/parts/${HUB}/fits?inferred=0&kind=other&relation=fits&page=5&pageSize=10`)
    expect(groupsOf(past.body)[0]).toMatchObject({ total: 37, results: [] })
  })
})

describe('what fits and path follow edits without loading the graph again', () => {
  it('shows a changed, then a removed link in the next answer', async () => {
    const loads = t.services.graphIndex.loads
    const list = await editor.get(`/api/links?part=${spoke(1)}`)
    const link = list.body.items[0] as { id: number }
    const changed = await editor
      .patch(`/api/links/${link.id}`)
      .send({ relation: 'does-not-fit', note: 'Checked: the bolt circle differs.' })
    expect(changed.status).toBe(200)
    const after = groupsOf((await editor.get(`/api/parts/${HUB}/fits?inferred=0&relation=does-not-fit&pageSize=50`)).body)
    const moved = after[0]!.results.find((r) => r.part.partNumber === spoke(1))!
    expect(moved.explanation[0]!.text).toContain('the bolt circle differs')
    expect((await editor.get(`/api/graph/path?from=${HUB}&to=${spoke(2)}`)).body.found).toBe(true)
    const second = (await editor.get(`/api/links?part=${spoke(2)}`)).body.items[0] as { id: number }
    expect((await editor.delete(`/api/links/${second.id}`)).status).toBe(204)
    expect((await editor.get(`/api/graph/path?from=${HUB}&to=${spoke(2)}`)).body.found).toBe(false)
    const fits = groupsOf((await editor.get(`/api/parts/${HUB}/fits?inferred=0&relation=fits&pageSize=50`)).body)[0]!
    expect(numbersOf(fits)).not.toContain(spoke(2))
    expect(fits.total).toBe(35)
    expect(t.services.graphIndex.loads).toBe(loads)
  })

  it('splits an identity class when the identity joining it is removed', async () => {
    const loads = t.services.graphIndex.loads
    const ab = await editor.post('/api/identities').send({ partA: 'ZZ-ID-A', partB: 'ZZ-ID-B' })
    const bc = await editor.post('/api/identities').send({ partA: 'ZZ-ID-B', partB: 'ZZ-ID-C' })
    expect([ab.status, bc.status]).toEqual([201, 201])
    expect((await editor.post('/api/links').send({ fromPart: 'ZZ-ID-C', toPart: 'ZZ-ID-X', relation: 'fits' })).status).toBe(201)
    const joined = (await editor.get('/api/parts/ZZ-ID-A/fits?inferred=0')).body
    expect(joined.identical.map((p: { partNumber: string }) => p.partNumber).sort()).toEqual(['ZZ-ID-B', 'ZZ-ID-C'])
    expect(groupsOf(joined).flatMap(numbersOf)).toContain('ZZ-ID-X')
    expect((await editor.delete(`/api/identities/${bc.body.id}`)).status).toBe(204)
    const split = (await editor.get('/api/parts/ZZ-ID-A/fits?inferred=0')).body
    expect(split.identical.map((p: { partNumber: string }) => p.partNumber)).toEqual(['ZZ-ID-B'])
    expect(groupsOf(split).flatMap(numbersOf)).not.toContain('ZZ-ID-X')
    const stillC = (await editor.get('/api/parts/ZZ-ID-C/fits?inferred=0')).body
    expect(stillC.identical).toEqual([])
    expect(groupsOf(stillC).flatMap(numbersOf)).toEqual(['ZZ-ID-X'])
    expect((await editor.get('/api/graph/path?from=ZZ-ID-A&to=ZZ-ID-X')).body.found).toBe(false)
    expect(t.services.graphIndex.loads).toBe(loads)
  })
})
