import { mkdtempSync, rmSync, writeFileSync } from 'node:fs'
import { tmpdir } from 'node:os'
import path from 'node:path'
import fc from 'fast-check'
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { vehicleInputSchema } from '../../shared/schemas/vehicles'
import { createTestApp, type TestApp } from '../helpers/test-app'

/*
 * Property: any vehicle applications, exported as vehicles.csv and previewed
 * as a vehicles import, change nothing, whatever their names hold.
 */

const name = (required: boolean) =>
  fc
    .oneof(
      fc.string({ unit: 'grapheme', maxLength: 12 }),
      fc.constantFrom('=Tarn', 'Vell, estate', '"Orrin"', '-S', '@home', 'line\nbreak'),
    )
    .filter((value) => !value.includes('\u0000') && value.length <= 60)
    .map((value) => value.trim())
    .filter((value) => !required || value.length > 0)

const vehicleArb = fc
  .record({
    years: fc.tuple(fc.integer({ min: 1950, max: 2100 }), fc.integer({ min: 0, max: 12 })),
    make: name(true),
    model: name(true),
    body: name(false),
    market: name(false),
    engineFamily: name(true),
    originals: fc.record(
      {
        block: fc.constantFrom('TM-BL-1800', 'TM-BL-2000'),
        head: fc.constantFrom('TM-HD-1800', 'TM-HD-2000'),
        ecu: fc.constant('TM-EC-1800'),
      },
      { requiredKeys: [] },
    ),
  })
  .map(({ years: [from, span], ...vehicle }) => ({ ...vehicle, yearFrom: from, yearTo: Math.min(2100, from + span) }))

let t: TestApp
const dir = mkdtempSync(path.join(tmpdir(), 'fitwright-vehicles-round-trip-'))
beforeAll(async () => {
  t = await createTestApp()
})
afterAll(async () => {
  await t.close()
  rmSync(dir, { recursive: true, force: true })
})

describe('vehicles.csv exported then previewed as a vehicles import (property, fast-check)', () => {
  it('changes nothing, for any applications', async () => {
    let total = (await t.services.vehicles.find({})).length
    await fc.assert(
      fc.asyncProperty(fc.array(vehicleArb, { minLength: 1, maxLength: 4 }), async (vehicles) => {
        // Each application its own: two that read alike in every key column are one application to a file.
        for (const vehicle of vehicles) {
          total += 1
          await t.services.vehicles.create(vehicleInputSchema.parse({ ...vehicle, model: `${vehicle.model} ${total}` }))
        }
        const csv = await t.services.exports.csv('vehicles.csv')
        const file = path.join(dir, 'vehicles.csv')
        writeFileSync(file, csv)
        const result = await t.services.imports.run({
          filePath: file,
          fileName: 'vehicles.csv',
          fileSize: Buffer.byteLength(csv),
          type: 'vehicles',
          mode: 'preview',
          validRowsOnly: false,
          user: { id: null, name: 'test' },
        })
        expect(result.errors).toEqual([])
        expect(result.changes).toEqual([])
        expect(result.counts).toEqual({ created: 0, updated: 0, unchanged: total, rejected: 0 })
      }),
      { numRuns: 20 },
    )
  })
})
