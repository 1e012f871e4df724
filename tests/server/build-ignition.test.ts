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

type Pair = {
  slots: string[]
  relation: string
  decidedBy: string
  reason: string
  modifications: string[]
  explanation: { text: string }[]
}
type Body = {
  verdict: string
  pairs: Pair[]
  modifications: { name: string; timeMinutes: number | null; reason: string }[]
  partsList: { description: string; partNumber?: string }[]
}
const evaluate = async (slots: Record<string, string>): Promise<Body> => {
  const response = await agent.post('/api/builds/evaluate').send({ slots })
  expect(response.status).toBe(200)
  return response.body as Body
}
const pairOf = (body: Body, a: string, b: string) => body.pairs.find((p) => p.slots[0] === a && p.slots[1] === b)!

describe('intake gasket as a port-pattern adapter', () => {
  it('an earlier manifold on a later head with the adapter gasket fits with a named, timed modification', async () => {
    const body = await evaluate({ head: 'TM-HD-2000', 'intake-manifold': 'TM-IM-1800', 'intake-gasket': 'TM-IG-2018' })
    const manifold = pairOf(body, 'intake-manifold', 'head')
    expect(manifold).toMatchObject({ relation: 'fits-with-modification', modifications: ['intake-port-adapter-gasket'] })
    expect(manifold.reason).toContain("IP-18 differs from the head's IP-20; the adapter gasket (head side IP-20, manifold side IP-18)")
    expect(pairOf(body, 'intake-gasket', 'head')).toMatchObject({
      relation: 'fits',
      reason: 'Adapter gasket head side IP-20 matches the head.',
    })
    expect(pairOf(body, 'intake-gasket', 'intake-manifold').relation).toBe('fits')
    const modification = body.modifications.find((m) => m.name === 'intake-port-adapter-gasket')!
    expect(modification.timeMinutes).toBe(60)
  })

  it('a plain gasket leaves the same manifold not fitting, as before', async () => {
    const body = await evaluate({ head: 'TM-HD-2000', 'intake-manifold': 'TM-IM-1800', 'intake-gasket': 'TM-IG-1800' })
    expect(body.verdict).toBe('does-not-fit')
    const manifold = pairOf(body, 'intake-manifold', 'head')
    expect(manifold.relation).toBe('does-not-fit')
    expect(manifold.reason).toMatch(/IP-18 does not match the head's IP-20, and the build's intake gasket does not adapt/)
  })

  it('the adapter gasket on a head of its manifold side does not fit the head', async () => {
    const body = await evaluate({ head: 'TM-HD-1800', 'intake-manifold': 'TM-IM-1800', 'intake-gasket': 'TM-IG-2018' })
    expect(pairOf(body, 'intake-gasket', 'head')).toMatchObject({ relation: 'does-not-fit' })
    expect(pairOf(body, 'intake-gasket', 'head').reason).toContain("head side IP-20 does not match the head's IP-18")
    expect(pairOf(body, 'intake-manifold', 'head').relation).toBe('fits')
  })
})

describe('distributor pickup against the control unit', () => {
  it('matching pickup and input fit', async () => {
    const pair = pairOf(await evaluate({ distributor: 'TM-DS-2000', ecu: 'TM-EC-2000' }), 'distributor', 'ecu')
    expect(pair).toMatchObject({
      relation: 'fits',
      reason: "Distributor optical pickup gives the signal the control unit's square-wave ignition input reads.",
    })
  })

  it('an inductive pickup into a square-wave input takes a signal converter', async () => {
    const body = await evaluate({ distributor: 'TM-DS-1802', ecu: 'TM-EC-1790' })
    expect(pairOf(body, 'distributor', 'ecu')).toMatchObject({
      relation: 'fits-with-modification',
      modifications: ['pickup-signal-converter'],
    })
    expect(pairOf(body, 'distributor', 'ecu').reason).toContain("AC signal; the control unit's square-wave ignition input cannot read it")
    expect(body.partsList.map((line) => line.description)).toContain('Inductive-to-square-wave ignition signal converter')
  })

  it('a Hall-effect pickup into an inductive input has no known conversion', async () => {
    const pair = pairOf(await evaluate({ distributor: 'TM-DS-1800', ecu: 'TM-EC-1780' }), 'distributor', 'ecu')
    expect(pair.relation).toBe('does-not-fit')
    expect(pair.reason).toMatch(
      /hall-effect pickup gives a square wave; the control unit's inductive ignition input cannot read it and no known conversion/,
    )
  })

  it('Hall-effect and optical pickups both feed a square-wave input, and an inductive pickup its own input', async () => {
    expect(pairOf(await evaluate({ distributor: 'TM-DS-1800', ecu: 'TM-EC-1800' }), 'distributor', 'ecu').relation).toBe('fits')
    expect(pairOf(await evaluate({ distributor: 'TM-DS-1802', ecu: 'TM-EC-1780' }), 'distributor', 'ecu').relation).toBe('fits')
  })
})

describe('leads after a distributor internals transfer', () => {
  const transfer = { head: 'TM-HD-1800', distributor: 'TM-DS-2000' }

  it('judges the leads against the cap of the housing fitted, not the donor', async () => {
    const fits = pairOf(await evaluate({ ...transfer, 'ignition-leads': 'TM-IL-1800' }), 'ignition-leads', 'distributor')
    expect(fits.relation).toBe('fits')
    expect(fits.reason).toBe(
      "Lead set cap style CAP-A matches the CAP-A cap of the DM-3 housing (as TM-DS-1800) the internals move into; the donor distributor's CAP-B cap is not fitted.",
    )
    const misfit = pairOf(await evaluate({ ...transfer, 'ignition-leads': 'TM-IL-2000' }), 'ignition-leads', 'distributor')
    expect(misfit.relation).toBe('does-not-fit')
    expect(misfit.reason).toMatch(/CAP-B does not match the CAP-A cap of the DM-3 housing .* not the donor distributor's CAP-B/)
  })

  it("without a transfer the leads go on the distributor's own cap", async () => {
    const own = pairOf(
      await evaluate({ head: 'TM-HD-2000', distributor: 'TM-DS-2000', 'ignition-leads': 'TM-IL-2000' }),
      'ignition-leads',
      'distributor',
    )
    expect(own).toMatchObject({ relation: 'fits', reason: 'Lead set cap style CAP-B matches the distributor.' })
    const noHead = pairOf(await evaluate({ distributor: 'TM-DS-2000', 'ignition-leads': 'TM-IL-1800' }), 'ignition-leads', 'distributor')
    expect(noHead.relation).toBe('does-not-fit')
  })
})

describe('an adapter plate that lifts the distributor drive', () => {
  it('a 12 mm dog under the 8 mm plate keeps 4 of the 8 mm it needs: plate and the listed longer dog', async () => {
    const body = await evaluate({ head: 'TM-HD-1800', distributor: 'TM-DS-2008' })
    const pair = pairOf(body, 'distributor', 'head')
    expect(pair.relation).toBe('fits-with-modification')
    expect(pair.modifications.sort()).toEqual(['distributor-adapter-plate', 'longer-drive-dog'])
    expect(pair.reason).toContain('the plate lifts the drive 8 mm, so the drive dog keeps 4 mm of its 12 mm (at least 8 mm, two thirds')
    const plate = body.modifications.find((m) => m.name === 'distributor-adapter-plate')!
    expect(plate.reason).toContain("the head's DM-3 mount; fit adapter plate TM-XA-0203")
    const longer = body.modifications.find((m) => m.name === 'longer-drive-dog')!
    expect(longer.reason).toContain('fit the 8 mm longer drive dog, which engages 12 mm')
    expect(body.partsList.find((line) => line.description.startsWith('Distributor adapter plate'))?.partNumber).toBe('TM-XA-0203')
  })

  it('a 26 mm dog keeps 18 mm on the plate: the plate alone', async () => {
    const pair = pairOf(await evaluate({ head: 'TM-HD-1800', distributor: 'TM-DS-2009' }), 'distributor', 'head')
    expect(pair).toMatchObject({ relation: 'fits-with-modification', modifications: ['distributor-adapter-plate'] })
    expect(pair.reason).toContain('keeps 18 mm of its 26 mm (at least 17.33 mm')
  })

  it('with no longer dog listed the 4 mm left does not fit, and the rules agree with the reviewed link', async () => {
    const pair = pairOf(await evaluate({ head: 'TM-HD-1800', distributor: 'TM-DS-2005' }), 'distributor', 'head')
    expect(pair).toMatchObject({ relation: 'does-not-fit', decidedBy: 'link' })
    const texts = pair.explanation.map((step) => step.text).join(' ')
    expect(texts).toContain('keeps 4 mm of its 12 mm')
    expect(texts).toContain('no longer drive dog that restores it is listed')
    expect(texts).not.toMatch(/rules alone would say/)
  })
})

describe('the part page agrees with the planner on companion parts', () => {
  it("a sealed distributor's heads are judged with the catalogue's adapter plate, not as if none existed", async () => {
    const response = await agent.get('/api/parts/TM-DS-2008/fits?kind=head')
    expect(response.status).toBe(200)
    const results = (
      response.body.groups as {
        results: { part: { partNumber: string }; relation: string; modifications: { name: string }[]; explanation: { text: string }[] }[]
      }[]
    ).flatMap((group) => group.results)
    const head = results.find((r) => r.part.partNumber === 'TM-HD-1800')!
    expect(head.relation).toBe('fits-with-modification')
    expect(head.modifications.map((m) => m.name).sort()).toEqual(['distributor-adapter-plate', 'longer-drive-dog'])
    expect(head.explanation.map((s) => s.text).join(' ')).toContain('keeps 4 mm of its 12 mm')
  })

  it('judges again when an editor imports a thinner adapter plate: the cached verdict follows the catalogue', async () => {
    const fitsOf1800 = async () => {
      const response = await agent.get('/api/parts/TM-DS-2008/fits?kind=head')
      const results = (
        response.body.groups as {
          results: { part: { partNumber: string }; modifications: { name: string }[]; explanation: { text: string }[] }[]
        }[]
      ).flatMap((group) => group.results)
      return results.find((r) => r.part.partNumber === 'TM-HD-1800')!
    }
    expect((await fitsOf1800()).modifications.map((m) => m.name)).toContain('longer-drive-dog')
    const editor = await t.signIn('editor')
    const header = 'part_number,kind,name,family,thickness_mm,quantity_per_pack,adapts_from_mount,adapts_to_mount'
    const row = 'TM-XA-0203,other,"Distributor adapter plate, two-slot to three-bolt",Service,2.0,1,DM-2S,DM-3'
    const response = await uploadCsv(editor, `${header}\n${row}\n`, { type: 'parts', mode: 'commit' })
    expect(response.status).toBe(201)
    // 12 mm of dog under a 2 mm plate keeps 10 mm, above the 8 mm two thirds: the plate alone.
    const head = await fitsOf1800()
    expect(head.modifications.map((m) => m.name)).toEqual(['distributor-adapter-plate'])
    expect(head.explanation.map((s) => s.text).join(' ')).toContain('keeps 10 mm of its 12 mm')
  })
})
