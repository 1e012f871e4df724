import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { uploadCsv } from '../helpers/imports'
import { createTestApp, type TestApp } from '../helpers/test-app'

let t: TestApp
let agent: Awaited<ReturnType<TestApp['signIn']>>
beforeAll(async () => {
  t = await createTestApp()
  agent = await t.signIn('tech')
})
afterAll(() => t.close())

type Pair = { slots: string[]; relation: string; reason: string; modifications: string[] }
type Body = {
  pairs: Pair[]
  cautions: { text: string; manual?: string }[]
  partsList: { description: string; quantity: number }[]
  figures: { compressionRatio: number; camCrankCentreMm: number }
}
const evaluate = async (slots: Record<string, string>): Promise<Body> => {
  const response = await agent.post('/api/builds/evaluate').send({ slots })
  expect(response.status).toBe(200)
  return response.body as Body
}
const pairOf = (body: Body, a: string, b: string) => body.pairs.find((p) => p.slots[0] === a && p.slots[1] === b)!
const REPAIRED = { block: 'TM-BL-2000', head: 'TM-HD-1812', 'head-gasket': 'TM-HG-2000' }

/*
 * Projection = bolt length - (boss + compressed gasket + washer); at most tapped depth minus two
 * pitches (38 - 2 x 1.5 = 35 mm) [common practice]. Demo figures: TM-BL-2000 tapped 38 mm, M11x1.5;
 * TM-HG-2000 compresses to 1.2 mm; the bolts' own washer is 2.0 mm; TM-HD-1812 has 88 mm bosses
 * except 85 mm at position 9.
 */
describe('head-bolt boss heights per bolt position', () => {
  it('one lower boss gets a washer under that bolt only: 124 - (85 + 1.2 + 2) = 35.8 mm bottoms, one 2 mm washer leaves 33.8', async () => {
    const body = await evaluate({ ...REPAIRED, 'head-bolt': 'TM-HB-1810' })
    const bolts = pairOf(body, 'head-bolt', 'block')
    expect(bolts.relation).toBe('fits-with-modification')
    expect(bolts.modifications).toEqual(['hardened-washer-stack'])
    expect(bolts.reason).toMatch(
      /^Position 9 \(boss 85 mm\): bottoms by 0\.8 mm: add one hardened washer \(2 mm\) under this bolt only, leaving 33\.8 mm/,
    )
    // The other nine: 124 - (88 + 1.2 + 2) = 32.8 mm, within 35: no washers for them.
    expect(bolts.reason).not.toMatch(/Position [1-8]\b|Position 10/)
    const washers = body.partsList.find((line) => line.description.startsWith('Hardened washers for the odd bolt positions'))!
    expect(washers).toMatchObject({ quantity: 1 })
    expect(washers.description).toContain('TM-XW-1120')
  })

  it('never puts washers under torque-to-yield bolts: the answer is the bolt length for that position', async () => {
    const body = await evaluate({ ...REPAIRED, 'head-bolt': 'TM-HB-2000' })
    const bolts = pairOf(body, 'head-bolt', 'block')
    expect(bolts.relation).toBe('does-not-fit')
    const reasons = body.pairs.map((p) => p.reason).join(' ')
    expect(reasons).toMatch(/Position 9 \(boss 85 mm\): bottoms by 4\.8 mm; torque-to-yield bolts never get washers/)
    // Bolt lengths that fit: 88 mm bosses 107.7–126.2 mm, the 85 mm boss 104.7–123.2 mm; both: 108–123 mm.
    expect(reasons).toContain('a set of 108–123 mm bolts fits every position')
    expect(body.partsList.some((line) => line.description.startsWith('Hardened washers for the odd bolt positions'))).toBe(false)
  })

  it('a head without per-position heights is judged on its one boss height, as before', async () => {
    const body = await evaluate({ block: 'TM-BL-2000', head: 'TM-HD-1810', 'head-gasket': 'TM-HG-2000', 'head-bolt': 'TM-HB-1810' })
    expect(pairOf(body, 'head-bolt', 'block').relation).toBe('fits')
  })

  it('refuses boss heights that do not read as mm per position, naming the column', async () => {
    const editor = await t.signIn('editor')
    const csv = 'part_number,kind,name,boss_heights_mm\nTM-HD-1899,head,Test head,"88,88,85"\n'
    const response = await uploadCsv(editor, csv, { type: 'parts' })
    expect(JSON.stringify(response.body)).toMatch(/Boss heights are mm per bolt position/)
    expect(JSON.stringify(response.body)).toMatch(/boss_heights_mm/)
  })
})

/*
 * Static compression ratio = (swept + clearance) / clearance [Heywood, Internal Combustion Engine
 * Fundamentals, eq. 2.7 definition], worked by hand for TM-BL-2000 (bore 86, stroke 86, deck 0.25,
 * piston 4.0 cc) and TM-HG-2000 (bore 87, 1.2 mm): swept 499.56 cc, gasket 7.13 cc, deck 1.45 cc.
 * New head 44.0 cc: 9.83. Skimmed head 42.8 cc: 10.02.
 */
describe('a skimmed head is its own part', () => {
  const BUILD = { block: 'TM-BL-2000', 'head-gasket': 'TM-HG-2000', 'head-bolt': 'TM-HB-2000' }

  it('has its own chamber volume, so its compression ratio is its own', async () => {
    const fresh = await evaluate({ ...BUILD, head: 'TM-HD-2000' })
    const skimmed = await evaluate({ ...BUILD, head: 'TM-HD-2000R' })
    expect(fresh.figures.compressionRatio).toBeCloseTo(9.83, 2)
    expect(skimmed.figures.compressionRatio).toBeCloseTo(10.02, 2)
    // Crank to deck 214.8 + gasket 1.2 + cam above deck: 84.0 new, 83.75 skimmed.
    expect(fresh.figures.camCrankCentreMm).toBeCloseTo(300.0, 2)
    expect(skimmed.figures.camCrankCentreMm).toBeCloseTo(299.75, 2)
  })

  it('carries the skim cautions, pointing to the service manual; the new head does not', async () => {
    const skim = (body: Body) => body.cautions.find((c) => /has been skimmed/.test(c.text))
    expect(skim(await evaluate({ ...BUILD, head: 'TM-HD-2000R' }))).toMatchObject({
      text: expect.stringContaining('skimmed 0.25 mm'),
      manual: 'cylinder head resurfacing limits and cam timing',
    })
    expect(skim(await evaluate({ ...BUILD, head: 'TM-HD-2000' }))).toBeUndefined()
  })

  it('is no longer an identical number of the new head: the counter sees it as a substitute with its differences', async () => {
    const counter = await t.signIn('counter')
    const substitutes = (await counter.get('/api/parts/TM-HD-2000/substitutes')).body as {
      items: { part: { partNumber: string }; differences: { name: string; this: unknown; other: unknown }[] }[]
    }
    const reman = substitutes.items.find((item) => item.part.partNumber === 'TM-HD-2000R')!
    expect(reman.differences).toContainEqual({ name: 'chamberCc', this: 44, other: 42.8 })
  })
})
