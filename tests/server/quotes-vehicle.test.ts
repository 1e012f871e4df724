import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { createTestApp, type TestApp } from '../helpers/test-app'

type Agent = Awaited<ReturnType<TestApp['signIn']>>
type QuoteVehicle = { modelYear: number | null; vin: string | null; make: string | null; model: string | null; engineFamily: string | null }
type Vehicle = { id: number; make: string; model: string; yearFrom: number; originals: { slot: string; partNumber: string }[] }

let t: TestApp
let tech: Agent
beforeAll(async () => {
  t = await createTestApp()
  tech = await t.signIn('tech')
})
afterAll(() => t.close())

/** The demo maker's 1994 VIN (worked by hand in vehicles.test.ts): its year matches the Tarn, the Vell and the Orrin. */
const VIN = 'TMWVL3414R1234567'

async function quoteVehicleOf(body: Record<string, unknown>): Promise<QuoteVehicle> {
  const response = await tech.post('/api/quotes').send(body)
  expect(response.status, JSON.stringify(response.body)).toBe(201)
  const quote = response.body as { id: number; vehicle: QuoteVehicle }
  // Read back as stored, not only as answered.
  expect((await tech.get(`/api/quotes/${quote.id}`)).body.vehicle).toEqual(quote.vehicle)
  return quote.vehicle
}

async function vehicle(model: string, year: number): Promise<Vehicle> {
  const found = (await tech.get(`/api/vehicles?year=${year}&make=Talmark&model=${model}`)).body as Vehicle[]
  return found[0]!
}

describe('the vehicle on a quote', () => {
  it('carries make, model and engine family of the vehicle the planner started from', async () => {
    const vell = await vehicle('Vell', 1993)
    const slots = Object.fromEntries(vell.originals.slice(0, 3).map((original) => [original.slot, original.partNumber]))
    expect(await quoteVehicleOf({ slots, chassisModelYear: 1993, vehicleId: vell.id })).toEqual({
      modelYear: 1993,
      vin: null,
      make: 'Talmark',
      model: 'Vell',
      engineFamily: 'TK20V',
    })
  })

  it('carries them from a build sheet saved from that vehicle', async () => {
    const tarn = await vehicle('Tarn', 1996)
    const saved = await tech
      .post('/api/builds')
      .send({ name: 'Tarn head job', slots: { block: 'TM-BL-1800', head: 'TM-HD-1810' }, vehicleId: tarn.id })
    expect(saved.status, JSON.stringify(saved.body)).toBe(201)
    expect(saved.body.vehicleId).toBe(tarn.id)
    expect(await quoteVehicleOf({ buildSheetId: saved.body.id })).toMatchObject({ make: 'Talmark', model: 'Tarn', engineFamily: 'TK18' })
  })

  it('takes them from the VIN when its maker and year match one application the build shares parts with', async () => {
    // The Tarn left the factory with this block and head; the Vell and the Orrin with neither.
    expect(await quoteVehicleOf({ slots: { block: 'TM-BL-1800', head: 'TM-HD-1800' }, vin: VIN })).toEqual({
      modelYear: null,
      vin: VIN,
      make: 'Talmark',
      model: 'Tarn',
      engineFamily: 'TK18',
    })
  })

  it('names only the make when the VIN and parts fit two models equally', async () => {
    // The Tarn's block with the Vell's head: one original part each.
    expect(await quoteVehicleOf({ slots: { block: 'TM-BL-1800', head: 'TM-HD-2000' }, vin: VIN })).toMatchObject({
      make: 'Talmark',
      model: null,
      engineFamily: null,
    })
  })

  it('leaves them out for a maker the catalogue does not know, or a vehicle removed since', async () => {
    // The regulation's worked sample VIN: a real maker's WMI, not in the demo.
    const foreign = await quoteVehicleOf({ slots: { block: 'TM-BL-1800' }, vin: '1G4AH59H45G118341' })
    expect(foreign).toMatchObject({ vin: '1G4AH59H45G118341', make: null, model: null, engineFamily: null })
    expect(await quoteVehicleOf({ slots: { block: 'TM-BL-1800' }, vehicleId: 999_999 })).toMatchObject({ make: null, model: null })
  })

  it('refuses a vehicle id that is not a positive whole number', async () => {
    expect((await tech.post('/api/quotes').send({ slots: { block: 'TM-BL-1800' }, vehicleId: 'Vell' })).status).toBe(400)
    expect((await tech.post('/api/quotes').send({ slots: { block: 'TM-BL-1800' }, vehicleId: -2 })).status).toBe(400)
  })

  it('still reads a quote saved before make and model were kept', async () => {
    const made = (await tech.post('/api/quotes').send({ slots: { block: 'TM-BL-1800' }, vin: VIN })).body as { id: number }
    const [row] = (await t.db.all('SELECT "body" FROM quote WHERE "id" = ?', [made.id])) as { body: string }[]
    const body = JSON.parse(row!.body) as { vehicle: Record<string, unknown> }
    body.vehicle = { modelYear: 1994, vin: VIN }
    await t.db.run('UPDATE quote SET "body" = ? WHERE "id" = ?', [JSON.stringify(body), made.id])
    const read = await tech.get(`/api/quotes/${made.id}`)
    expect(read.status).toBe(200)
    expect(read.body.vehicle).toEqual({ modelYear: 1994, vin: VIN, make: null, model: null, engineFamily: null })
  })
})
