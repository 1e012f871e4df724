import { describe, expect, it } from 'vitest'
import type { StockItem } from '@shared/schemas/stock'
import { blankDraft, draftOf, formErrors, inputOf, updateOf } from '@/lib/stock-draft'

const unit: StockItem = {
  id: 7,
  partNumber: 'TM-HD-1800',
  site: { id: 2, name: 'Hollin yard, lot B', address: '' },
  condition: 'used',
  grade: 'B',
  mileageKm: 164000,
  donorVin: '1ZZAA11AXS1000000',
  donorYear: 1995,
  damageNotes: '',
  location: 'Rack H4',
  priceCents: 12500,
  coreChargeCents: 0,
  status: 'available',
  label: 'HY-B-0441',
  updatedAt: '2026-12-02T10:00:00.000Z',
}

describe('inputOf', () => {
  it('turns the typed form into a new unit, the price into whole cents', () => {
    const draft = { ...blankDraft('Northgate counter'), partNumber: 'TM-HD-2000', price: '455.5', label: ' NG-1 ' }
    expect(inputOf(draft)).toEqual({
      ok: true,
      value: expect.objectContaining({
        partNumber: 'TM-HD-2000',
        site: 'Northgate counter',
        priceCents: 45550,
        coreChargeCents: 0,
        label: 'NG-1',
      }),
    })
  })

  it('names each bad field: a negative price, a missing part number, a donor year that is no year', () => {
    const draft = { ...blankDraft('Northgate counter'), condition: 'used' as const, price: '-3', donorYear: '19x5' }
    const checked = inputOf(draft)
    expect(checked.ok).toBe(false)
    if (checked.ok) return
    expect(checked.errors.price).toBe('An amount cannot be negative.')
    expect(checked.errors.partNumber).toBe('Give a part number.')
    expect(checked.errors.donorYear).toBeDefined()
  })

  it('drops a grade for a unit that is not used', () => {
    const draft = { ...blankDraft('Northgate counter'), partNumber: 'TM-HD-2000', price: '10', grade: 'A' as const }
    expect(inputOf(draft)).toMatchObject({ ok: true, value: { grade: null } })
  })
})

describe('updateOf', () => {
  it('sends only what changed, so moving a unit sends the site and the shelf', () => {
    const draft = { ...draftOf(unit), site: 'Northgate counter', location: 'Aisle 1' }
    expect(updateOf(draft, unit)).toEqual({ ok: true, value: { site: 'Northgate counter', location: 'Aisle 1' } })
  })

  it('reprices in cents and says so when nothing changed', () => {
    expect(updateOf({ ...draftOf(unit), price: '119.90' }, unit)).toEqual({ ok: true, value: { priceCents: 11990 } })
    expect(updateOf(draftOf(unit), unit)).toEqual({ ok: false, errors: { form: 'Nothing has changed yet.' } })
  })
})

describe('formErrors', () => {
  it('puts the server messages on the form fields', () => {
    expect(
      formErrors([
        { path: 'priceCents', message: 'Too much.' },
        { path: 'site', message: 'No site.' },
      ]),
    ).toEqual({
      price: 'Too much.',
      site: 'No site.',
    })
  })
})
