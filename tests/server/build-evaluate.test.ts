import { readdirSync, readFileSync } from 'node:fs'
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

type DemoBuild = {
  name: string
  slots: Record<string, string>
  targetPowerKw?: number
  fuelOctane?: number
  chassisModelYear?: number
  vin?: string
}
const demoBuilds = JSON.parse(readFileSync('data/demo/builds.json', 'utf8')) as DemoBuild[]
const ruleFilesText = readdirSync('rules')
  .filter((file) => file.endsWith('.json'))
  .map((file) => readFileSync(`rules/${file}`, 'utf8'))
  .join('\n')
const demo = (name: string) => demoBuilds.find((b) => b.name === name)!
const evaluate = (build: Omit<DemoBuild, 'name'>) => agent.post('/api/builds/evaluate').send(build)

type Pair = { slots: string[]; relation: string; decidedBy: string; ruleIds: string[]; explanation: { text: string }[] }
const pairOf = (pairs: Pair[], a: string, b: string) => pairs.find((p) => p.slots[0] === a && p.slots[1] === b)!

describe('POST /api/builds/evaluate on the demo builds', () => {
  it.each([
    ['TK20V as built at the factory', 'fits', []],
    ['TK20V head on a TK18 block', 'fits-with-modification', ['oil-restrictor-fit']],
    [
      'TK18 head on a TK20V block, TK20V electronics',
      'fits-with-modification',
      [
        'distributor-internals-transfer',
        'hardened-washer-stack',
        'injector-resistor-pack',
        'oil-restrictor-remove-duplicate',
        'vvl-leads-insulate',
      ],
    ],
    ['TK20V engine on a TK18 control unit, 1997 car', 'fits-with-modification', ['injector-data-rescale', 'vvl-lockout']],
    ['TK20V fixed-lift head with the OBD-II control unit', 'fits-with-modification', ['vvl-leads-insulate']],
    ['Domed pistons on regular fuel, too much power asked', 'does-not-fit', []],
    ['TK18 head on a TK20V block with torque-to-yield bolts', 'does-not-fit', ['oil-restrictor-remove-duplicate']],
    ['TK20V head on a TK18 block with the old bolts', 'does-not-fit', ['oil-restrictor-fit']],
    ['Salvage exhaust manifold on a TK20V head', 'unknown', []],
    ['TK18 intake manifold on a TK20V head with the adapter gasket', 'fits-with-modification', ['intake-port-adapter-gasket']],
    ['Early inductive distributor on a later TK18 control unit', 'fits-with-modification', ['pickup-signal-converter']],
    [
      'Sealed TK20V distributor on a TK18 head through the adapter plate',
      'fits-with-modification',
      ['distributor-adapter-plate', 'longer-drive-dog'],
    ],
  ])('"%s" is %s with modifications %j', async (name, verdict, modifications) => {
    const { name: _name, ...build } = demo(name)
    const response = await evaluate(build)
    expect(response.status).toBe(200)
    expect(response.body.verdict).toBe(verdict)
    expect(response.body.modifications.map((m: { name: string }) => m.name).sort()).toEqual(modifications)
  })

  it('judges injectors against the flow the control unit is calibrated for, both at the same pressure', async () => {
    // Hand-worked: TK20V injectors flow 250 cc/min and the TK18 unit is calibrated for 190 cc/min, both rated at 3.0 bar,
    // so the pressures cancel and the mismatch is 250 / 190 - 1 = +31.6 %, beyond the tenth the fuel trims absorb
    // (orifice law: flow proportional to the square root of the pressure drop, any fluid-mechanics text; the tenth is common practice).
    const rich = (await evaluate({ slots: { ecu: 'TM-EC-1800', injector: 'TM-IN-2000' } })).body
    const pair = rich.pairs.find((p: Pair) => p.slots.includes('ecu') && p.slots.includes('injector'))
    expect(pair).toMatchObject({ relation: 'fits-with-modification', modifications: ['injector-data-rescale'] })
    expect(pair.reason).toContain('31.6 % more than the 190 cc/min')
    // The TK18 injector on its own unit: the same flow, no work.
    const matched = (await evaluate({ slots: { ecu: 'TM-EC-1800', injector: 'TM-IN-1800' } })).body
    expect(matched.verdict).toBe('fits')
    expect(matched.modifications).toEqual([])
    // Smaller than calibrated runs lean: 190 / 250 - 1 = -24 %.
    const lean = (await evaluate({ slots: { ecu: 'TM-EC-2096', injector: 'TM-IN-1800' } })).body
    expect(lean.pairs[0].reason).toContain('24 % less than the 250 cc/min')
  })

  it('together, the demo builds show every shipped rule file firing', async () => {
    const fired = new Set<string>()
    for (const { name: _name, ...build } of demoBuilds) {
      const body = (await evaluate(build)).body
      for (const pair of body.pairs as Pair[]) for (const id of pair.ruleIds) fired.add(id)
      for (const caution of body.cautions as { ruleId?: string }[]) if (caution.ruleId) fired.add(caution.ruleId)
    }
    const rules = (await agent.get('/api/rules')).body as { id: string }[]
    expect(rules.length).toBeGreaterThanOrEqual(15)
    expect([...fired].sort()).toEqual(rules.map((r) => r.id).sort())
  })

  it('together, the demo builds show every verdict, every compliance status and every modification the rules can call for', async () => {
    const verdicts = new Set<string>()
    const compliance = new Set<string>()
    const applied = new Set<string>()
    for (const { name: _name, ...build } of demoBuilds) {
      const body = (await evaluate(build)).body as { verdict: string; compliance: { status: string }; modifications: { name: string }[] }
      verdicts.add(body.verdict)
      compliance.add(body.compliance.status)
      for (const modification of body.modifications) applied.add(modification.name)
    }
    expect([...verdicts].sort()).toEqual(['does-not-fit', 'fits', 'fits-with-modification', 'unknown'])
    expect([...compliance].sort()).toEqual(['blocked', 'check', 'ok'])
    const named = new Set<string>()
    for (const spec of JSON.parse(readFileSync('rules/catalogue/modifications.json', 'utf8')) as { name: string }[]) named.add(spec.name)
    const calledByRules = [...named].filter((name) => ruleFilesText.includes(`"modification": "${name}"`))
    expect(calledByRules.filter((name) => !applied.has(name))).toEqual([])
  })

  it('judges only mating pairs whose two slots are filled and lists the empty slots', async () => {
    const response = await evaluate({ slots: { head: 'TM-HD-2000', block: 'TM-BL-2000' } })
    expect(response.body.pairs.map((p: Pair) => p.slots.join('+'))).toEqual(['head+block'])
    expect(response.body.missingSlots).toHaveLength(16)
    expect(response.body.missingSlots).not.toContain('head')
    expect(response.body.verdict).toBe('fits')
  })

  it('calls a pair with neither link nor deciding rule unknown, never a fit', async () => {
    const response = await evaluate({ slots: { head: 'TM-HD-2000', 'exhaust-manifold': 'TM-EM-9001' } })
    const pair = pairOf(response.body.pairs, 'exhaust-manifold', 'head')
    expect(pair).toMatchObject({ relation: 'unknown', decidedBy: 'none' })
    expect(pair.explanation[0]!.text).toMatch(/no evidence/i)
  })

  it('names the catalogue part a modification needs, and the other parts of that kind that would do', async () => {
    const body = (await evaluate({ slots: { head: 'TM-HD-2000', block: 'TM-BL-1800' } })).body
    const restrictor = body.partsList.find((l: { description: string }) => l.description.startsWith('Oil feed restrictor for the block'))
    // The demo catalogue's two restrictors, first in part-number order; the other offered as an alternative.
    expect(restrictor).toMatchObject({ partNumber: 'TM-OR-1800', category: 'modification' })
    expect(restrictor.description).toMatch(/alternatives: TM-OR-2000$/)
  })

  it('lets a reviewed link outrank the rules and says which decided', async () => {
    const response = await evaluate({ slots: { head: 'TM-HD-2000', block: 'TM-BL-1800', 'oil-restrictor': 'TM-OR-1800' } })
    const headOnBlock = pairOf(response.body.pairs, 'head', 'block')
    expect(headOnBlock.decidedBy).toBe('link')
    expect(pairOf(response.body.pairs, 'oil-restrictor', 'block').decidedBy).toBe('rule')
  })

  it('works out a washer stack for reusable bolts that would bottom, with washers for every bolt in the parts list', async () => {
    const { name: _name, ...build } = demo('TK18 head on a TK20V block, TK20V electronics')
    const body = (await evaluate(build)).body
    // Projection = 128 - (88 + 1.2 + 2.0) = 36.8 mm > 38 - 2 x 1.5 = 35 mm: bottoms (common practice rule of 2 pitches clearance)
    expect(body.figures.headBoltProjectionMm).toBeCloseTo(36.8, 2)
    expect(body.figures.headBoltMaxProjectionMm).toBeCloseTo(35, 2)
    expect(body.figures.washerStackMm).toBe(2)
    const washers = body.partsList.find((l: { description: string }) => l.description.startsWith('Hardened washer'))
    expect(washers).toMatchObject({ quantity: 10, category: 'modification' })
    const housing = body.partsList.find((l: { description: string }) => l.description.startsWith('Distributor housing'))
    expect(housing.partNumber).toBe('TM-DS-1800')
    expect(body.cautions.map((c: { text: string }) => c.text).join(' ')).toMatch(/warning lamp stays on/)
  })

  it('refuses washers under torque-to-yield bolts and gives the bolt lengths that would work', async () => {
    const { name: _name, ...build } = demo('TK18 head on a TK20V block with torque-to-yield bolts')
    const body = (await evaluate(build)).body
    const bolts = pairOf(body.pairs, 'head-bolt', 'block')
    expect(bolts.relation).toBe('does-not-fit')
    expect(bolts.explanation.map((s) => s.text).join(' ')).toMatch(/torque-angle/)
    // grip 88 + 1.4 + 2 = 91.4; lengths 91.4 + 16.5 ... 91.4 + 35
    expect(body.figures.headBoltLengthRangeMm).toEqual({ min: 108, max: 126 })
  })

  it('computes the figures a builder checks, with the static compression ratio by the textbook formula', async () => {
    const { name: _name, ...build } = demo('TK20V as built at the factory')
    const body = (await evaluate(build)).body
    // Heywood, Internal Combustion Engine Fundamentals, sec. 2.2 [published]: CR = (Vs + Vc) / Vc,
    // from the parts' own attributes: bore = stroke 86 mm, chamber 44 cc, gasket 87 x 1.2 mm, deck 0.25 mm, dish 4 cc.
    const cyl = (dMm: number, hMm: number) => (Math.PI / 4) * (dMm / 10) ** 2 * (hMm / 10)
    const vs = cyl(86, 86)
    const vc = 44 + cyl(87, 1.2) + cyl(86, 0.25) + 4
    expect(body.figures.compressionRatio).toBeCloseTo((vs + vc) / vc, 2)
    expect(body.figures.displacementCc).toBeCloseTo(4 * vs, 0)
    expect(body.figures.injectorHeadroomPct).toBeGreaterThan(10)
    expect(body.figures.beltCentreShiftMm).not.toBeNull()
  })

  it('gives the whole bill: chosen parts with quantities, modification parts and consumables', async () => {
    const { name: _name, ...build } = demo('TK20V head on a TK18 block')
    const lines = (await evaluate(build)).body.partsList as {
      partNumber?: string
      quantity: number
      category: string
      description: string
      reason: string
    }[]
    expect(lines.filter((l) => l.category === 'chosen')).toHaveLength(Object.keys(build.slots).length)
    expect(lines.find((l) => l.partNumber === 'TM-IN-2000')!.quantity).toBe(4)
    expect(lines.find((l) => l.partNumber === 'TM-HB-2000')!.reason).toMatch(/single-use/)
    expect(lines.find((l) => l.category === 'modification' && l.partNumber === 'TM-OR-1800')).toBeDefined()
    expect(lines.some((l) => l.category === 'consumable' && /Injector O-rings/.test(l.description) && l.quantity === 4)).toBe(true)
  })

  it('warns about emissions law for a pre-OBD-II control unit in a 1996-or-later vehicle, and about engine age', async () => {
    const { name: _name, ...build } = demo('TK20V engine on a TK18 control unit, 1997 car')
    const cautions = (await evaluate(build)).body.cautions as { severity: string; text: string; reference?: string }[]
    const obd = cautions.find((c) => /OBD-II/.test(c.text))!
    expect(obd.severity).toBe('danger')
    expect(obd.reference).toMatch(/J1962/)
    expect(cautions.some((c) => /older than the vehicle/.test(c.text))).toBe(true)
    expect(cautions[0]!.severity).toBe('danger')
    expect(cautions.some((c) => /licensed practice/.test(c.text))).toBe(true)
  })

  it('warns, never blocks, on compression ratio against fuel octane', async () => {
    const base = { slots: { block: 'TM-BL-2000HC', head: 'TM-HD-2000', 'head-gasket': 'TM-HG-2000' } }
    const regular = (await evaluate({ ...base, fuelOctane: 87 })).body
    expect(regular.verdict).toBe('fits')
    expect(regular.cautions.some((c: { text: string }) => /knock/.test(c.text))).toBe(true)
    const premium = (await evaluate({ ...base, fuelOctane: 93 })).body
    expect(premium.cautions.some((c: { text: string }) => /on 93 AKI fuel risks knock/.test(c.text))).toBe(false)
  })

  it('reads the chassis model year from a VIN (49 CFR 565.15 sample, model year 2005)', async () => {
    const body = (await evaluate({ slots: { ecu: 'TM-EC-1800', head: 'TM-HD-1800' }, vin: '1G4AH59H45G118341' })).body
    expect(body.figures.chassisModelYear).toBe(2005)
    expect(body.cautions.some((c: { text: string }) => /OBD-II/.test(c.text))).toBe(true)
  })

  it('warns without rejecting when a VIN check digit is wrong', async () => {
    const body = (await evaluate({ slots: { head: 'TM-HD-1800' }, vin: '1G4AH59H46G118341' })).body
    expect(body.cautions.some((c: { text: string }) => c.text.startsWith('VIN'))).toBe(true)
  })
})

describe('POST /api/builds/evaluate with bad input', () => {
  it.each([
    [{ slots: { cylinder: 'TM-BL-2000' } }, 'slots.cylinder', /Unknown slot "cylinder"/],
    [{ slots: { head: 'NO-SUCH' } }, 'slots.head', /Unknown part number "NO-SUCH"/],
    [{ slots: { block: 'TM-HD-2000' } }, 'slots.block', /is a cylinder head, not a cylinder block/],
    [{ slots: { head: ['TM-HD-2000', 'TM-HD-1800'] } }, 'slots.head', /Two parts in one slot/],
    [{ slots: { head: 'TM-HD-2000' }, targetPowerKw: -5 }, 'targetPowerKw', /above zero/],
    [{}, 'slots', /.+/],
  ])('answers 400 for %j naming %s', async (body, path, message) => {
    expectBadRequest(await agent.post('/api/builds/evaluate').send(body), path, message)
  })

  it('names every bad part at once', async () => {
    const response = await agent.post('/api/builds/evaluate').send({ slots: { head: 'NOPE', block: 'NOPE-2' } })
    expect(response.body.error.details.map((d: { path: string }) => d.path).sort()).toEqual(['slots.block', 'slots.head'])
  })

  it('refuses unknown slots in one detail before looking up any part', async () => {
    const response = await agent.post('/api/builds/evaluate').send({ slots: { head: 'NOPE', cylinder: 'X', spoiler: 'Y' } })
    expect(response.body.error.details).toEqual([
      { path: 'slots.cylinder', message: expect.stringMatching(/^Unknown slot "cylinder", "spoiler"\. Slots are: /) },
    ])
  })
})
