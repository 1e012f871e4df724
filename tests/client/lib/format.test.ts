import { describe, expect, it } from 'vitest'
import { formatBasisPoints, formatCount, formatDate, formatDateTime, formatDecimal, formatDuration, formatMoney } from '@/lib/format'

// Expected strings are the Unicode CLDR patterns for each locale (medium date, short time,
// decimal grouping, short units), as published in the CLDR charts; they are not read back from our code.
const utc = { timeZone: 'UTC' }

describe('formatting for the browser locale', () => {
  it.each([
    ['en-GB', '4 Mar 2026', '4 Mar 2026, 09:05'],
    ['de-DE', '04.03.2026', '04.03.2026, 09:05'],
  ])('writes dates and date-times in the %s pattern', (locale, date, dateTime) => {
    const iso = '2026-03-04T09:05:00Z'
    expect(formatDate(iso, { ...utc, locale })).toBe(date)
    expect(formatDateTime(iso, { ...utc, locale })).toBe(dateTime)
  })

  it.each([
    ['en-GB', 120071, '120,071'],
    ['de-DE', 120071, '120.071'],
    ['en-GB', 999, '999'],
    ['en-GB', 1234567, '1,234,567'],
  ])('groups the digits of a count in %s: %d → %s', (locale, value, expected) => {
    expect(formatCount(value, { locale })).toBe(expected)
  })

  it('keeps a figure to its decimals with the locale decimal sign', () => {
    expect(formatDecimal(1795.5, 0, { locale: 'en-GB' })).toBe('1,796')
    expect(formatDecimal(8.5, 2, { locale: 'en-GB' })).toBe('8.50')
    expect(formatDecimal(8.5, 2, { locale: 'de-DE' })).toBe('8,50')
  })

  it.each([
    [45, '45 mins'],
    [1, '1 min'],
    [60, '1 hr'],
    [90, '1 hr 30 mins'],
    [150.4, '2 hrs 30 mins'],
    [0, '0 mins'],
  ])('writes %d minutes of labour as %s in en-GB', (minutes, expected) => {
    expect(formatDuration(minutes, { locale: 'en-GB' })).toBe(expected)
  })

  // CLDR currency patterns: en-GB puts the symbol first, de-DE after the amount with a no-break space (U+00A0).
  it.each([
    ['en-GB', 123450, 'EUR', '€1,234.50'],
    ['en-GB', 5, 'GBP', '£0.05'],
    ['de-DE', 123450, 'EUR', '1.234,50\u00a0€'],
    ['en-GB', -1999, 'USD', '-US$19.99'],
  ])('writes %s money from integer cents: %d %s → %s', (locale, cents, currency, expected) => {
    expect(formatMoney(cents, currency, { locale })).toBe(expected)
  })

  it('writes a tax rate held in basis points as a percentage', () => {
    expect(formatBasisPoints(2000, { locale: 'en-GB' })).toBe('20%')
    expect(formatBasisPoints(825, { locale: 'en-GB' })).toBe('8.25%')
    expect(formatBasisPoints(825, { locale: 'de-DE' })).toBe('8,25\u00a0%')
  })

  it('uses the runtime default locale when none is given, as the browser does', () => {
    const runtime = new Intl.NumberFormat().resolvedOptions().locale
    expect(formatCount(120071)).toBe(formatCount(120071, { locale: runtime }))
    expect(formatDate('2026-03-04T12:00:00Z')).toBe(new Date('2026-03-04T12:00:00Z').toLocaleDateString(runtime, { dateStyle: 'medium' }))
  })
})
