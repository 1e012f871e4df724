import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { expectBadRequest } from '../helpers/expect-error'
import { createTestApp, type TestApp } from '../helpers/test-app'

/*
 * Limits checked here: a multi-layer steel gasket about 30 µin Ra (0.762 µm, 1 µin = 0.0254 µm exactly)
 * and 0.05 mm out of flat; a composite one about 125 µin (3.175 µm) and 0.1 mm [common practice, from memory].
 */
let t: TestApp
let agent: Awaited<ReturnType<TestApp['signIn']>>
beforeAll(async () => {
  t = await createTestApp()
  agent = await t.signIn('tech')
})
afterAll(() => t.close())

type Pair = { slots: string[]; relation: string; decidedBy: string; reason: string; modifications: string[] }
type Body = {
  verdict: string
  pairs: Pair[]
  cautions: { severity: string; text: string; manual?: string }[]
  modifications: { name: string }[]
}
const evaluate = async (body: Record<string, unknown>): Promise<Body> => {
  const response = await agent.post('/api/builds/evaluate').send(body)
  expect(response.status).toBe(200)
  return response.body as Body
}
const pairOf = (body: Body, a: string, b: string) => body.pairs.find((p) => p.slots[0] === a && p.slots[1] === b)!
const MLS = { block: 'TM-BL-1800', head: 'TM-HD-1810', 'head-gasket': 'TM-HG-1807' }
const COMPOSITE = { block: 'TM-BL-1800', head: 'TM-HD-1810', 'head-gasket': 'TM-HG-1800' }

describe('deck and head face finish against the head gasket', () => {
  it('a 2.4 µm deck under a multi-layer steel gasket is resurfaced first, with the limit named and the epoxy caution', async () => {
    const body = await evaluate({ slots: MLS, deckRaUm: 2.4, deckFlatnessMm: 0.03 })
    const deck = pairOf(body, 'head-gasket', 'block')
    expect(deck.relation).toBe('fits-with-modification')
    expect(deck.modifications).toContain('deck-resurface')
    expect(deck.reason).toContain('rougher than the 0.76 µm a multi-layer steel gasket seals on')
    expect(body.modifications.map((m) => m.name)).toContain('deck-resurface')
    const epoxy = body.cautions.find((c) => /epoxy/.test(c.text))!
    expect(epoxy).toMatchObject({ severity: 'warning', manual: 'cylinder head and block resurfacing limits' })
  })

  it('the same deck seals under a composite gasket, whose limit is 3.18 µm', async () => {
    const deck = pairOf(await evaluate({ slots: COMPOSITE, deckRaUm: 2.4, deckFlatnessMm: 0.03 }), 'head-gasket', 'block')
    expect(deck.modifications).not.toContain('deck-resurface')
    expect(deck.relation).not.toBe('does-not-fit')
  })

  it('a head face 0.08 mm out of flat is skimmed under multi-layer steel (0.05 mm) but not under composite (0.1 mm)', async () => {
    const mls = pairOf(await evaluate({ slots: MLS, headRaUm: 0.5, headFlatnessMm: 0.08 }), 'head-gasket', 'head')
    expect(mls.modifications).toEqual(['head-face-resurface'])
    expect(mls.reason).toContain('0.08 mm out of flat, more than the 0.05 mm')
    const composite = pairOf(await evaluate({ slots: COMPOSITE, headRaUm: 0.5, headFlatnessMm: 0.08 }), 'head-gasket', 'head')
    expect(composite.modifications).not.toContain('head-face-resurface')
  })

  it("a reviewed link knows the parts, not this engine's deck: the resurface still applies on top of it", async () => {
    const editor = await t.signIn('editor')
    const created = await editor
      .post('/api/links')
      .send({ fromPart: 'TM-HG-1807', toPart: 'TM-BL-1800', relation: 'fits', note: 'Bench-checked.' })
    expect(created.status).toBe(201)
    const rough = pairOf(await evaluate({ slots: MLS, deckRaUm: 2.4, deckFlatnessMm: 0.03 }), 'head-gasket', 'block')
    expect(rough).toMatchObject({ decidedBy: 'link', relation: 'fits-with-modification', modifications: ['deck-resurface'] })
    expect(rough.reason).toMatch(/^Block deck as measured/)
    const smooth = pairOf(await evaluate({ slots: MLS, deckRaUm: 0.5, deckFlatnessMm: 0.02 }), 'head-gasket', 'block')
    expect(smooth).toMatchObject({ decidedBy: 'link', relation: 'fits', modifications: [] })
  })

  it('asks for the readings when a multi-layer steel gasket goes on faces nobody measured', async () => {
    const body = await evaluate({ slots: MLS })
    expect(body.cautions.some((c) => c.severity === 'info' && /measure the deck and the head face/.test(c.text))).toBe(true)
    const measured = await evaluate({ slots: MLS, deckRaUm: 0.5, deckFlatnessMm: 0.02 })
    expect(measured.cautions.some((c) => /measure the deck and the head face/.test(c.text))).toBe(false)
  })

  it.each([
    [{ deckRaUm: 40 }, 'deckRaUm', /Deck finish must be at most 25 µm Ra/],
    [{ headFlatnessMm: -0.1 }, 'headFlatnessMm', /Head face out-of-flat cannot be below zero/],
    [{ deckFlatnessMm: 'flat' }, 'deckFlatnessMm', /Deck out-of-flat must be a number of mm/],
  ])('answers 400 for %j naming %s', async (context, path, message) => {
    expectBadRequest(await agent.post('/api/builds/evaluate').send({ slots: MLS, ...context }), path, message)
  })

  it('a saved sheet keeps the readings and is judged with them', async () => {
    const saved = await agent.post('/api/builds').send({ name: 'Rough deck', slots: MLS, deckRaUm: 2.4, deckFlatnessMm: 0.03 })
    expect(saved.status).toBe(201)
    expect(saved.body.faceFinish).toEqual({ deckRaUm: 2.4, deckFlatnessMm: 0.03 })
    expect(saved.body.verdict).toBe('fits-with-modification')
    const cleared = await agent.put(`/api/builds/${saved.body.id}`).send({ faceFinish: null })
    expect(cleared.body.faceFinish).toBeNull()
  })
})
