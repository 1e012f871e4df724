import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { createTestApp, type TestApp } from '../helpers/test-app'

let t: TestApp
let agent: Awaited<ReturnType<TestApp['signIn']>>
beforeAll(async () => {
  t = await createTestApp()
  agent = await t.signIn('tech')
})
afterAll(() => t.close())

type Step = { type: string; text: string; relation?: string }
type Pair = { slots: string[]; relation: string; reason: string; explanation: Step[] }
const evaluate = (body: object) => agent.post('/api/builds/evaluate').send(body)

describe('POST /api/builds/evaluate deciding reasons', () => {
  it('gives a does-not-fit gasket the failing bore rule as its reason, with failing evidence before passing', async () => {
    // TK18 gasket (84.5 mm bore) on the TK20V block (86 mm bores); the bolt pattern P10-A matches.
    const body = (await evaluate({ slots: { block: 'TM-BL-2000', 'head-gasket': 'TM-HG-1800' } })).body
    const pair = (body.pairs as Pair[]).find((p) => p.slots.includes('head-gasket'))!
    expect(pair.relation).toBe('does-not-fit')
    expect(pair.reason).toMatch(/84\.5/)
    expect(pair.reason).not.toMatch(/pattern/i)
    const rules = pair.explanation.filter((s) => s.type === 'rule')
    expect(rules[0]!.relation).toBe('does-not-fit')
    expect(rules.findIndex((s) => s.relation === 'fits')).toBeGreaterThan(rules.findIndex((s) => s.relation === 'does-not-fit'))
  })

  it('gives a fits-with-modification pair the modification as its reason', async () => {
    const body = (await evaluate({ slots: { block: 'TM-BL-1800', head: 'TM-HD-2000' } })).body
    const pair = (body.pairs as Pair[]).find((p) => p.relation === 'fits-with-modification')!
    const modification = body.modifications[0] as { reason: string }
    expect(pair.reason).toBe(modification.reason)
  })
})

describe('POST /api/builds/evaluate road-legality', () => {
  it('blocks compliance for an OBD-I control unit in a 1999 car, while the mechanical verdict stays its own', async () => {
    const body = (await evaluate({ slots: { ecu: 'TM-EC-1800', head: 'TM-HD-1800' }, chassisModelYear: 1999 })).body
    expect(body.compliance.status).toBe('blocked')
    expect(body.compliance.reasons.join(' ')).toMatch(/OBD-II/)
    expect(body.verdict).not.toBe('does-not-fit')
  })

  it('keeps compliance ok for the same car with an OBD-II control unit', async () => {
    const body = (await evaluate({ slots: { ecu: 'TM-EC-2096', head: 'TM-HD-2000' }, chassisModelYear: 1999 })).body
    expect(body.compliance).toEqual({ status: 'ok', reasons: [] })
  })

  it('blocks compliance when emission controls are removed, whatever the year', async () => {
    const body = (await evaluate({ slots: { head: 'TM-HD-2000' }, chassisModelYear: 1990, emissionControlsRemoved: true })).body
    expect(body.compliance.status).toBe('blocked')
    expect(body.compliance.reasons.join(' ')).toMatch(/tampering/)
  })

  it('asks for a check when no model year is given', async () => {
    const body = (await evaluate({ slots: { head: 'TM-HD-2000' } })).body
    expect(body.compliance.status).toBe('check')
    expect(body.compliance.reasons[0]).toMatch(/model year/)
  })

  it('answers out-of-range octane with the trade words and the field named', async () => {
    const response = await evaluate({ slots: { head: 'TM-HD-2000' }, fuelOctane: 300 })
    expect(response.status).toBe(400)
    expect(response.body.error.details).toEqual([{ path: 'fuelOctane', message: 'Octane must be between 80 and 120.' }])
  })
})

describe('POST /api/builds/evaluate trade checks', () => {
  type CautionBody = { severity: string; text: string }
  const cautionsOf = async (body: object) => (await evaluate(body)).body.cautions as CautionBody[]

  it('works out quench as deck clearance plus compressed gasket and flags it wide (0.30 + 1.40 = 1.70 mm, hand-worked)', async () => {
    const body = (await evaluate({ slots: { block: 'TM-BL-1800', 'head-gasket': 'TM-HG-1800' } })).body
    expect(body.figures.quenchMm).toBeCloseTo(1.7, 2)
    expect((body.cautions as CautionBody[]).some((c) => /Quench works out at 1.7 mm/.test(c.text))).toBe(true)
  })

  it('raises no quench caution inside the usual band (0.30 + 0.70 = 1.00 mm, common practice band 0.9-1.15 mm)', async () => {
    const body = (await evaluate({ slots: { block: 'TM-BL-1800', 'head-gasket': 'TM-HG-1807' } })).body
    expect(body.figures.quenchMm).toBeCloseTo(1.0, 2)
    expect((body.cautions as CautionBody[]).some((c) => /Quench/.test(c.text))).toBe(false)
  })

  it('gives the lifting caution only when the job takes the engine out', async () => {
    const slots = { block: 'TM-BL-1800', head: 'TM-HD-1800' }
    expect((await cautionsOf({ slots })).some((c) => /Lifting an engine/.test(c.text))).toBe(false)
    expect((await cautionsOf({ slots, engineOut: true })).some((c) => /Lifting an engine/.test(c.text))).toBe(true)
  })

  it('adds the usual shop cautions for the jobs in the build', async () => {
    const texts = (
      await cautionsOf({ slots: { block: 'TM-BL-1800', head: 'TM-HD-1800', 'head-bolt': 'TM-HB-1800', 'timing-belt': 'TM-TB-1800' } })
    ).map((c) => c.text)
    expect(texts.some((t) => /blind head-bolt holes/.test(t))).toBe(true)
    expect(texts.some((t) => /two full turns/.test(t))).toBe(true)
    expect(texts.some((t) => /coolant scalds/.test(t) && /eye protection/.test(t) && /local rules/.test(t))).toBe(true)
    expect(texts.some((t) => /piston-to-valve/.test(t))).toBe(true)
  })
})
