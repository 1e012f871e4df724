import { describe, expect, it } from 'vitest'
import type { QuoteLine } from '@shared/schemas/quotes'
import { hasUnpricedLines, holdNote, jobNumber, linePrice, lineQuantity, lineSource, quoteSections } from '@/lib/quote'
import { shopSettingsForm, shopSettingsFromForm } from '@/lib/shop-settings-form'

const en = { locale: 'en-GB' }
const head: QuoteLine = {
  kind: 'part',
  partNumber: 'TM-HD-2000',
  description: 'TK20V cylinder head',
  quantity: 1,
  unitPriceCents: 48900,
  toOrder: false,
  stockItemId: 7,
  condition: 'new',
  site: 'Northgate counter',
  location: 'Aisle 3, shelf 2',
}
const toOrder: QuoteLine = {
  kind: 'part',
  partNumber: 'TM-CP-2000',
  description: 'Crank pulley',
  quantity: 1,
  unitPriceCents: 0,
  toOrder: true,
}
const labour: QuoteLine = {
  kind: 'labour',
  description: 'Fit an oil feed restrictor',
  quantity: 0.75,
  minutes: 45,
  unitPriceCents: 8450,
  toOrder: false,
}
const core: QuoteLine = {
  kind: 'core',
  partNumber: 'TM-HD-2000',
  description: 'Core charge',
  quantity: 1,
  unitPriceCents: 5000,
  toOrder: false,
}

describe('a quote as the customer reads it', () => {
  it('numbers the job by year and quote number', () => {
    expect(jobNumber({ id: 12, createdAt: '2026-12-02T15:00:00.000Z' })).toBe('2026-00012')
  })

  it('says until when an accepted quote holds its units, and when the hold ran out', () => {
    const accepted = { status: 'accepted' as const, reservedUntil: '2026-12-05T09:00:00.000Z' }
    const options = { locale: 'en-GB', timeZone: 'UTC' }
    expect(holdNote(accepted, new Date('2026-12-02T15:00:00Z'), options)).toBe('units held until 5 Dec 2026, 09:00')
    expect(holdNote(accepted, new Date('2026-12-06T15:00:00Z'), options)).toBe('the hold on its units ran out on 5 Dec 2026, 09:00')
    expect(holdNote({ status: 'draft', reservedUntil: null }, new Date(), options)).toBeNull()
  })

  it('lists parts with their core charges first and labour after, leaving out an empty section', () => {
    expect(quoteSections([head, core, labour, toOrder]).map((s) => [s.title, s.lines])).toEqual([
      ['Parts and consumables', [head, core, toOrder]],
      ['Labour', [labour]],
    ])
    expect(quoteSections([labour]).map((s) => s.title)).toEqual(['Labour'])
  })

  it('says where a unit is taken from, or that it is to order', () => {
    expect(lineSource(head)).toBe('Northgate counter, Aisle 3, shelf 2 · new')
    expect(lineSource(toOrder)).toBe('order')
    expect(lineSource(labour)).toBe('')
  })

  it('prices labour by its minutes at the hourly rate, and an unpriced line on request, never as free', () => {
    // 45 min at €84.50/h = €63.375, rounded half up to €63.38 (worked by hand).
    expect(linePrice(labour, 'EUR', en)).toEqual({ unit: '€84.50 / h', total: '€63.38' })
    expect(lineQuantity(labour, en)).toBe('45 mins')
    expect(linePrice(toOrder, 'EUR', en)).toEqual({ unit: 'on request', total: 'on request' })
    expect(hasUnpricedLines([head, labour])).toBe(false)
    expect(hasUnpricedLines([head, toOrder])).toBe(true)
  })
})

describe('the shop settings form', () => {
  const settings = {
    name: 'Harl Street Engines',
    address: '3 Harl Street',
    labourRateCents: 8450,
    taxRateBasisPoints: 825,
    currency: 'EUR',
    baseMinutesPerGroup: 45,
    reservationHours: 72,
  }

  it('shows money and the tax rate as decimals and reads them back exactly', () => {
    const form = shopSettingsForm(settings)
    expect(form).toMatchObject({ labourRate: '84.50', taxRate: '8.25' })
    expect(shopSettingsFromForm({ ...form, currency: 'gbp' })).toEqual({ settings: { ...settings, currency: 'GBP' } })
  })

  it('names each field that cannot be saved as typed', () => {
    const result = shopSettingsFromForm({ ...shopSettingsForm(settings), labourRate: '84.5.0', taxRate: '-1', currency: 'EURO', name: ' ' })
    expect('errors' in result && result.errors.map((e) => e.path).sort()).toEqual([
      'currency',
      'labourRateCents',
      'name',
      'taxRateBasisPoints',
    ])
  })

  it('asks for the minutes and hours when their number fields are left empty', () => {
    const empty = shopSettingsFromForm({ ...shopSettingsForm(settings), baseMinutesPerGroup: null, reservationHours: null })
    expect('errors' in empty && empty.errors).toEqual([
      { path: 'baseMinutesPerGroup', message: 'Give the minutes per group (0 for none).' },
      { path: 'reservationHours', message: 'Give how many hours a unit stays held.' },
    ])
  })
})
