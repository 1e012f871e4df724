import { afterEach, beforeEach, describe, expect, it } from 'vitest'
import { createTestApp, type TestApp } from '../helpers/test-app'

let t: TestApp
let counter: Awaited<ReturnType<TestApp['signIn']>>
beforeEach(async () => {
  t = await createTestApp()
  counter = await t.signIn('counter')
})
afterEach(() => t.close())

/**
 * A VIN of the demo maker (invented WMI TMW), model-year code R = 1994 (49 CFR 565.15 table, digit in
 * position 7 so the 1980-2009 cycle). Check digit worked by hand with the 565.15 values and weights:
 * T3·8 + M4·7 + W6·6 + V5·5 + L3·4 + 3·3 + 4·2 + 1·10 + R9·9 + 1·8 + 2·7 + 3·6 + 4·5 + 5·4 + 6·3 + 7·2
 * = 345, and 345 mod 11 = 4.
 */
const VIN = 'TMWVL3414R1234567'
const demoVin = () => VIN

describe('vehicles: start from the car', () => {
  it('narrows year, then make, then model', async () => {
    expect((await counter.get('/api/vehicles/choices?year=1994')).body).toEqual({ makes: ['Talmark'], models: [] })
    expect((await counter.get('/api/vehicles/choices?year=1994&make=Talmark')).body.models).toEqual(['Orrin', 'Tarn', 'Vell'])
    expect((await counter.get('/api/vehicles/choices?year=1997&make=Talmark')).body.models).toEqual(['Tarn', 'Vell'])
    const tarn = (await counter.get('/api/vehicles?year=1994&make=Talmark&model=Tarn')).body
    expect(tarn).toHaveLength(1)
    expect(tarn[0]).toMatchObject({ yearFrom: 1990, yearTo: 1995, engineFamily: 'TK18' })
    const head = tarn[0].originals.find((o: { slot: string }) => o.slot === 'head')
    expect(head).toMatchObject({ partNumber: 'TM-HD-1800', name: expect.stringContaining('head') })
    // Template order: the block comes first.
    expect(tarn[0].originals[0].slot).toBe('block')
    expect((await counter.get(`/api/vehicles/${tarn[0].id}`)).body.originals).toHaveLength(18)
    expect((await counter.get('/api/vehicles/9999')).status).toBe(404)
    expect((await counter.get('/api/vehicles?year=1890')).status).toBe(400)
  })

  it('decodes a VIN: check digit, model year, maker and the matching applications', async () => {
    const vin = demoVin()
    const answer = (await counter.get(`/api/vehicles/vin/${vin}`)).body
    expect(answer).toMatchObject({
      vin,
      checkDigit: { valid: true, found: vin[8], expected: vin[8] },
      modelYear: 1994,
      maker: 'Talmark Motor Works',
    })
    // 1994 Talmark applications: the Tarn (1990-95), the Vell (1992-95) and the Orrin (1994-96).
    expect(answer.applications.map((a: { model: string }) => a.model).sort()).toEqual(['Orrin', 'Tarn', 'Vell'])
    const wrongDigit = vin.slice(0, 8) + (vin[8] === '1' ? '2' : '1') + vin.slice(9)
    const warned = (await counter.get(`/api/vehicles/vin/${wrongDigit}`)).body
    expect(warned.checkDigit).toMatchObject({ valid: false, found: wrongDigit[8], expected: vin[8] })
    // The regulation's own worked sample: a real maker's WMI, not in this catalogue.
    expect((await counter.get('/api/vehicles/vin/1G4AH59H45G118341')).body).toMatchObject({
      checkDigit: { valid: true },
      maker: null,
      applications: [],
    })
  })

  it('names the position of a character a VIN cannot hold, and a wrong length', async () => {
    const withO = 'TMWVL3414R1O34567'
    const refused = await counter.get(`/api/vehicles/vin/${withO}`)
    expect(refused.status).toBe(400)
    expect(refused.body.error.message).toContain('Position 12 is O')
    const short = await counter.get('/api/vehicles/vin/TMWVL34')
    expect(short.status).toBe(400)
    expect(short.body.error.message).toContain('17 characters')
  })
})
