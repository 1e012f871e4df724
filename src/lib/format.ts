/**
 * Every date, count and duration the client shows goes through here, so one
 * screen never mixes formats. The locale is the browser's (Intl's default);
 * `locale` and `timeZone` are only passed by tests that need a fixed answer.
 */
export type FormatOptions = { locale?: string; timeZone?: string }

type DateInput = string | number | Date

const toDate = (value: DateInput) => (value instanceof Date ? value : new Date(value))

/** A calendar date, e.g. "4 Mar 2026" in en-GB. */
export function formatDate(value: DateInput, options: FormatOptions = {}): string {
  return new Intl.DateTimeFormat(options.locale, { dateStyle: 'medium', timeZone: options.timeZone }).format(toDate(value))
}

/** A date with the time to the minute, e.g. "4 Mar 2026, 09:05" in en-GB. */
export function formatDateTime(value: DateInput, options: FormatOptions = {}): string {
  return new Intl.DateTimeFormat(options.locale, { dateStyle: 'medium', timeStyle: 'short', timeZone: options.timeZone }).format(
    toDate(value),
  )
}

/** A whole count with the locale's group separators: "120,071" in en-GB, "120.071" in de-DE. */
export function formatCount(value: number, options: FormatOptions = {}): string {
  return new Intl.NumberFormat(options.locale, { maximumFractionDigits: 0 }).format(value)
}

/** A measured figure with a fixed number of decimals, so a column of figures lines up. */
export function formatDecimal(value: number, digits: number, options: FormatOptions = {}): string {
  return new Intl.NumberFormat(options.locale, { minimumFractionDigits: digits, maximumFractionDigits: digits }).format(value)
}

const unit = (value: number, name: 'hour' | 'minute', locale?: string) =>
  new Intl.NumberFormat(locale, { style: 'unit', unit: name, unitDisplay: 'short' }).format(value)

/** A labour time given in minutes, in hours and minutes ("1 hr 30 mins" in en-GB); under an hour in minutes only. */
export function formatDuration(minutes: number, options: FormatOptions = {}): string {
  const total = Math.max(0, Math.round(minutes))
  const hours = Math.floor(total / 60)
  const rest = total % 60
  if (hours === 0) return unit(rest, 'minute', options.locale)
  if (rest === 0) return unit(hours, 'hour', options.locale)
  return new Intl.ListFormat(options.locale, { style: 'narrow', type: 'unit' }).format([
    unit(hours, 'hour', options.locale),
    unit(rest, 'minute', options.locale),
  ])
}

/** Money held in integer cents, shown with two decimals in the browser's locale. */
export function formatCents(cents: number, options: FormatOptions = {}): string {
  return formatDecimal(cents / 100, 2, options)
}

/**
 * Money held in integer cents with its currency ("€1,234.50" in en-GB for EUR).
 * Always two decimals: the amounts are kept in hundredths whatever the currency.
 */
export function formatMoney(cents: number, currency: string, options: FormatOptions = {}): string {
  return new Intl.NumberFormat(options.locale, {
    style: 'currency',
    currency,
    minimumFractionDigits: 2,
    maximumFractionDigits: 2,
  }).format(cents / 100)
}

/** A rate in basis points as a percentage: 825 is "8.25%", 2000 is "20%". */
export function formatBasisPoints(basisPoints: number, options: FormatOptions = {}): string {
  return new Intl.NumberFormat(options.locale, { style: 'percent', maximumFractionDigits: 2 }).format(basisPoints / 10000)
}
