import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { expectBadRequest } from '../helpers/expect-error'
import { createTestApp, type TestApp } from '../helpers/test-app'

let t: TestApp
let agent: Awaited<ReturnType<TestApp['signIn']>>
beforeAll(async () => {
  t = await createTestApp()
  agent = await t.signIn('tech')
})
afterAll(() => t.close())

type Slot = {
  matesWith: string[]
  candidates: { part: { partNumber: string; kind: string }; relation: string; modifications: string[]; score: number }[]
  note?: string
}

describe('POST /api/builds/complete', () => {
  it('suggests, for each empty slot, parts that fit every filled slot it mates with', async () => {
    const response = await agent.post('/api/builds/complete').send({ slots: { block: 'TM-BL-1800', head: 'TM-HD-2000' } })
    expect(response.status).toBe(200)
    const slots = response.body.slots as Record<string, Slot>
    expect(Object.keys(slots)).not.toContain('head')
    const gears = slots['cam-gear']!.candidates.map((c) => c.part.partNumber)
    expect(gears).toEqual(expect.arrayContaining(['TM-CG-2000', 'TM-CG-2000A']))
    expect(gears).not.toContain('TM-CG-1800') // wrong camshaft nose for the TK20V head
    const gaskets = slots['head-gasket']!.candidates
    expect(gaskets.every((c) => c.part.kind === 'head-gasket')).toBe(true)
    expect(slots['intake-manifold']!.candidates.map((c) => c.part.partNumber)).not.toContain('TM-IM-1800')
  })

  it('puts the fewest and easiest modifications first', async () => {
    const response = await agent.post('/api/builds/complete').send({ slots: { head: 'TM-HD-1800' } })
    const distributors = (response.body.slots as Record<string, Slot>).distributor!.candidates
    const scores = distributors.map((c) => c.score)
    expect(scores).toEqual([...scores].sort((a, b) => a - b))
    expect(distributors[0]!.relation).toBe('fits')
    const transfer = distributors.find((c) => c.part.partNumber === 'TM-DS-2000')!
    expect(transfer.modifications).toEqual(['distributor-internals-transfer'])
    expect(distributors.map((c) => c.part.partNumber)).not.toContain('TM-DS-2005') // reviewed: does not fit
  })

  it('checks a candidate against all its filled mating slots at once', async () => {
    const response = await agent.post('/api/builds/complete').send({
      slots: {
        'cam-gear': 'TM-CG-2000',
        'crank-pulley': 'TM-CP-2000',
        block: 'TM-BL-2000',
        head: 'TM-HD-2000',
        'head-gasket': 'TM-HG-2000',
      },
    })
    const belts = (response.body.slots as Record<string, Slot>)['timing-belt']!.candidates.map((c) => c.part.partNumber)
    expect(belts).toEqual(['TM-TB-2000']) // the conversion belt is too short here; the narrow one too narrow
  })

  it('explains a slot with nothing to go on', async () => {
    const response = await agent.post('/api/builds/complete').send({ slots: { block: 'TM-BL-2000' } })
    const leads = (response.body.slots as Record<string, Slot>)['ignition-leads']!
    expect(leads.candidates).toEqual([])
    expect(leads.note).toMatch(/distributor/)
  })

  it('answers 400 for a bad slot, like evaluate', async () => {
    const response = await agent.post('/api/builds/complete').send({ slots: { head: 'TM-BL-2000' } })
    expectBadRequest(response, 'slots.head')
  })
})

describe('POST /api/builds/fill', () => {
  it('fills every empty slot of the classic swap so that the whole build works', async () => {
    const response = await agent.post('/api/builds/fill').send({ slots: { block: 'TM-BL-1800', head: 'TM-HD-2000' }, targetPowerKw: 100 })
    expect(response.status).toBe(200)
    expect(Object.keys(response.body.slots)).toHaveLength(18)
    expect(response.body.filled).toHaveLength(16)
    expect(response.body.unfilled).toEqual([])
    const evaluation = await agent.post('/api/builds/evaluate').send({ slots: response.body.slots, targetPowerKw: 100 })
    expect(['fits', 'fits-with-modification']).toContain(evaluation.body.verdict)
  })

  it('keeps the chosen parts and says why a slot stays empty', async () => {
    const response = await agent.post('/api/builds/fill').send({ slots: { head: 'TM-HD-2000', 'exhaust-manifold': 'TM-EM-9001' } })
    expect(response.body.slots).toMatchObject({ head: 'TM-HD-2000', 'exhaust-manifold': 'TM-EM-9001' })
    const gasket = response.body.unfilled.find((u: { slot: string }) => u.slot === 'exhaust-gasket')
    expect(gasket.note).toMatch(/fits every chosen part/)
  })
})

describe('fill the gaps and suggestions with the build context', () => {
  const tk18Engine = { block: 'TM-BL-1800', head: 'TM-HD-1810' }

  it('suggests the OBD-II control unit first for a 1999 car and says why the OBD-I unit is ranked lower', async () => {
    const response = await agent.post('/api/builds/complete').send({ slots: tk18Engine, chassisModelYear: 1999, only: ['ecu'] })
    const candidates = response.body.slots.ecu.candidates as { part: { partNumber: string }; setBackFor: string[] }[]
    expect(candidates[0]!.part.partNumber).toBe('TM-EC-1896')
    const obdI = candidates.find((c) => c.part.partNumber === 'TM-EC-1800')!
    expect(obdI.setBackFor.join(' ')).toMatch(/not road-legal/)
  })

  it('keeps a 1999 car on OBD-II when filling the gaps, and names the part it passed over', async () => {
    const response = await agent.post('/api/builds/fill').send({ slots: tk18Engine, chassisModelYear: 1999, targetPowerKw: 90 })
    expect(response.status).toBe(200)
    const ecu = response.body.slots.ecu as string
    const evaluation = await agent.post('/api/builds/evaluate').send({ slots: response.body.slots, chassisModelYear: 1999 })
    expect(evaluation.body.parts.ecu.attributes.diagnosticGeneration).toBe('obd-ii')
    expect(ecu).toBeDefined()
    expect(response.body.skipped.some((s: { slot: string; reason: string }) => s.slot === 'ecu' && /OBD-II/.test(s.reason))).toBe(true)
  })

  it('without a model year, ranks control units by modifications alone', async () => {
    const response = await agent.post('/api/builds/complete').send({ slots: tk18Engine, only: ['ecu'] })
    const candidates = response.body.slots.ecu.candidates as { setBackFor: string[] }[]
    expect(candidates.every((c) => c.setBackFor.length === 0)).toBe(true)
  })
})
