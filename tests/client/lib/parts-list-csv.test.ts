import Papa from 'papaparse'
import { describe, expect, it } from 'vitest'
import type { PartsListLine } from '@shared/schemas/build'
import { neutraliseCell } from '@shared/csv-cells'
import { partsListCsv, partsListFileName, PARTS_LIST_COLUMNS } from '@/lib/parts-list-csv'

function line(overrides: Partial<PartsListLine>): PartsListLine {
  return { description: 'Thing', quantity: 1, unit: 'piece', reason: 'Needed.', category: 'chosen', ...overrides }
}

function parse(csv: string): string[][] {
  return Papa.parse<string[]>(csv.trim(), { skipEmptyLines: true }).data
}

describe('parts list CSV', () => {
  it.each(['=SUM(A1:A9)', '+1+2', '-3+cmd', '@SUM(1)', '\tTAB', '\rCR'])('neutralises a cell that starts like a formula: %j', (value) => {
    expect(neutraliseCell(value)).toBe(`'${value}`)
  })

  it.each(['ZX-HD-2000', 'Gasket, 1.2 mm', '', 'a=b'])('leaves an ordinary cell as it is: %j', (value) => {
    expect(neutraliseCell(value)).toBe(value)
  })

  it('writes a header and one row a line, with quantities as numbers and every text cell neutralised', () => {
    const csv = partsListCsv([
      line({ partNumber: 'ZX-IN-2000', description: 'Injector', quantity: 4, reason: 'Chosen injectors.' }),
      line({ description: '=HYPERLINK("http://example.invalid")', quantity: 1, unit: 'set', category: 'consumable', reason: '@once' }),
    ])
    const rows = parse(csv)
    expect(rows[0]).toEqual([...PARTS_LIST_COLUMNS])
    expect(rows[1]).toEqual(['ZX-IN-2000', 'Injector', '4', 'piece', '', 'Chosen part', 'Chosen injectors.'])
    expect(rows[2]).toEqual(['', `'=HYPERLINK("http://example.invalid")`, '1', 'set', '', 'Consumable', "'@once"])
    expect(csv).toContain('\r\n')
  })

  it('keeps commas, quotes and line breaks inside a cell', () => {
    const rows = parse(partsListCsv([line({ description: 'Washer, hardened "M11"\nten', reason: 'a, b' })]))
    expect(rows[1]?.[1]).toBe('Washer, hardened "M11"\nten')
    expect(rows[1]?.[6]).toBe('a, b')
  })

  it('writes the units to take and what to order in the shelf column, prices in plain decimals', () => {
    const unit = { stockItemId: 1, site: 'Yard B', location: 'Rack H4', condition: 'used' as const, priceCents: 123456 }
    const rows = parse(
      partsListCsv([
        line({ partNumber: 'ZX-VL-1', quantity: 4, shelf: { take: [unit, { ...unit, stockItemId: 2, location: '' }], toOrder: 2 } }),
        line({ partNumber: 'ZX-GK-1', shelf: { take: [], toOrder: 1 } }),
      ]),
    )
    expect(rows[1]?.[4]).toBe('Yard B · Rack H4 · used · 1234.56; Yard B · no shelf given · used · 1234.56; order 2 more')
    expect(rows[2]?.[4]).toBe('order')
  })

  it('names the file after the build in letters, digits and dashes', () => {
    expect(partsListFileName('ZX head on a ZY block / v2')).toBe('zx-head-on-a-zy-block-v2-parts-list.csv')
    expect(partsListFileName('***')).toBe('build-parts-list.csv')
  })
})
