import { describe, expect, it } from 'vitest'
import { SLOT_IDS } from '@shared/build-template'
import type { BuildSheet } from '@shared/schemas/build'
import { filterSheets } from '@/lib/build-sheet-filter'

function sheet(id: number, name: string, slots: Record<string, string>, notes = ''): BuildSheet {
  return {
    id,
    name,
    slots,
    notes,
    checklist: {},
    verdict: null,
    labourMinutes: null,
    targetPowerKw: null,
    fuelOctane: null,
    chassisModelYear: null,
    vin: null,
    vehicleId: null,
    faceFinish: null,
    owner: { id: 1, name: 'A. Tech' },
    createdAt: '2026-01-01T00:00:00.000Z',
    updatedAt: '2026-01-01T00:00:00.000Z',
  }
}

const full = Object.fromEntries(SLOT_IDS.map((slot, i) => [slot, `TM-XX-${1000 + i}`]))
const sheets = [
  sheet(1, 'Bench swap for bay 3', { block: 'TM-BL-1800', head: 'TM-HD-2000' }, 'customer wants 110 kW'),
  sheet(2, 'Factory TK20V', { ...full, head: 'TM-HD-2016' }),
  sheet(3, 'Race head', { head: 'TM-HD-1800' }),
]
const names = (list: BuildSheet[]) => list.map((item) => item.name)

describe('filtering the build sheets list', () => {
  it.each([
    ['bay 3', ['Bench swap for bay 3']],
    ['CUSTOMER', ['Bench swap for bay 3']],
    ['TM-HD-20', ['Bench swap for bay 3', 'Factory TK20V']],
    ['tm hd 1800', ['Race head']],
    ['', ['Bench swap for bay 3', 'Factory TK20V', 'Race head']],
    ['nothing like it', []],
  ])('finds by name, notes or a part number in any slot: "%s"', (text, expected) => {
    expect(names(filterSheets(sheets, { text, completeness: 'all' }))).toEqual(expected)
  })

  it('keeps the sheets with every slot filled, or those with gaps, combined with the search', () => {
    expect(names(filterSheets(sheets, { text: '', completeness: 'complete' }))).toEqual(['Factory TK20V'])
    expect(names(filterSheets(sheets, { text: '', completeness: 'gaps' }))).toEqual(['Bench swap for bay 3', 'Race head'])
    expect(names(filterSheets(sheets, { text: 'head', completeness: 'gaps' }))).toEqual(['Race head'])
  })
})
