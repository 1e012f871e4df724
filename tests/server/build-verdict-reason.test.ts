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
