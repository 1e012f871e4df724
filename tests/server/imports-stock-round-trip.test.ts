import { mkdtempSync, rmSync, writeFileSync } from 'node:fs'
import { tmpdir } from 'node:os'
import path from 'node:path'
import fc from 'fast-check'
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { STOCK_CONDITIONS, stockInputSchema } from '../../shared/schemas/stock'
import { createTestApp, type TestApp } from '../helpers/test-app'

/*
 * Property: any units put on the shelves by hand, exported as stock.csv and
 * previewed as a stock import, change nothing: every price survives the trip
 * through decimals, and every text the spreadsheet would mangle comes back.
 */

// Any text a cell may hold except NUL (a file holding NUL is refused as binary); the form trims, so the file does too.
const text = (maxLength: number) =>
  fc
    .string({ unit: 'grapheme', maxLength })
    .filter((value) => !value.includes('\u0000') && value.length <= 100)
    .map((value) => value.trim())

const unitArb = fc
  .record({
    partNumber: fc.constantFrom('TM-HD-1800', 'TM-HD-2000', 'TM-BL-1800', 'TM-HG-1800'),
    site: fc.constantFrom('Northgate counter', 'Hollin yard, lot B'),
    condition: fc.constantFrom(...STOCK_CONDITIONS),
    grade: fc.constantFrom(null, 'A', 'B', 'C'),
    mileageKm: fc.option(fc.nat({ max: 5_000_000 })),
    donorVin: fc.constantFrom(null, '1ZZAA11AXS1000000'),
    donorYear: fc.option(fc.integer({ min: 1950, max: 2100 })),
    damageNotes: fc.oneof(text(60), fc.constantFrom('=cracked', 'Boss broken;\n"see photo"', '+1 over')),
    location: fc.oneof(text(30), fc.constantFrom('Aisle 3, shelf 2', '-2 level', "'quoted")),
    priceCents: fc.nat({ max: 100_000_000 }),
    coreChargeCents: fc.nat({ max: 100_000_000 }),
    status: fc.constantFrom('available', 'sold'),
    labelled: fc.boolean(),
  })
  .map(({ labelled, grade, condition, ...unit }) => ({ ...unit, condition, grade: condition === 'used' ? grade : null, labelled }))

let t: TestApp
const dir = mkdtempSync(path.join(tmpdir(), 'fitwright-stock-round-trip-'))
beforeAll(async () => {
  t = await createTestApp()
})
afterAll(async () => {
  await t.close()
  rmSync(dir, { recursive: true, force: true })
})

describe('stock.csv exported then previewed as a stock import (property, fast-check)', () => {
  it('changes nothing, for any units put on the shelves', async () => {
    let run = 0
    await fc.assert(
      fc.asyncProperty(fc.array(unitArb, { minLength: 1, maxLength: 6 }), async (units) => {
        run += 1
        for (const [index, { labelled, ...unit }] of units.entries()) {
          await t.services.stock.create(stockInputSchema.parse({ ...unit, label: labelled ? `RT-${run}-${index}` : null }))
        }
        const csv = await t.services.exports.csv('stock.csv')
        const file = path.join(dir, 'stock.csv')
        writeFileSync(file, csv)
        const result = await t.services.imports.run({
          filePath: file,
          fileName: 'stock.csv',
          fileSize: Buffer.byteLength(csv),
          type: 'stock',
          mode: 'preview',
          validRowsOnly: false,
          user: { id: null, name: 'test' },
        })
        expect(result.errors).toEqual([])
        expect(result.changes).toEqual([])
        expect(result.counts.unchanged).toBe((await t.services.stock.list({ page: 1, pageSize: 1 })).total)
      }),
      { numRuns: 25 },
    )
  })
})
