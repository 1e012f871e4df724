import { lineCents } from '@shared/quote-totals'
import type { EvaluateRequest } from '@shared/schemas/build'
import type { Quote, QuoteLine, QuoteVehicle } from '@shared/schemas/quotes'
import { formatCount, formatDateTime, formatDuration, formatMoney, type FormatOptions } from './format'

/** What a quote is made from: a saved build sheet, or the planner's build as it stands. */
export type QuoteBuild = { buildSheetId: number } | EvaluateRequest

export type QuoteSection = { title: string; lines: QuoteLine[] }

const CONDITION: Record<string, string> = { new: 'new', remanufactured: 'remanufactured', used: 'used', core: 'core' }

export { jobNumber } from '@shared/quote-job-number'

/** Make and model with the engine family, as a counter says the car ("Talmark Vell, TK20V engine"); empty when the quote has none. */
export function vehicleName(vehicle: Pick<QuoteVehicle, 'make' | 'model' | 'engineFamily'>): string {
  const name = [vehicle.make, vehicle.model].filter(Boolean).join(' ')
  return name && vehicle.engineFamily ? `${name}, ${vehicle.engineFamily} engine` : name
}

/** What an accepted quote says about its units: held until a time, or that the hold ran out and they went back on the shelf. */
export function holdNote(quote: Pick<Quote, 'status' | 'reservedUntil'>, now: Date, options: FormatOptions = {}): string | null {
  if (quote.status !== 'accepted' || !quote.reservedUntil) return null
  const until = formatDateTime(quote.reservedUntil, options)
  return new Date(quote.reservedUntil) > now ? `units held until ${until}` : `the hold on its units ran out on ${until}`
}

/** Parts (with their core charges and the consumables) first, then labour, as a customer reads a job. */
export function quoteSections(lines: readonly QuoteLine[]): QuoteSection[] {
  const sections: QuoteSection[] = [
    { title: 'Parts and consumables', lines: lines.filter((line) => line.kind !== 'labour') },
    { title: 'Labour', lines: lines.filter((line) => line.kind === 'labour') },
  ]
  return sections.filter((section) => section.lines.length > 0)
}

/** Where the unit comes from: its site and shelf and condition, or "order" when no shelf holds one. */
export function lineSource(line: QuoteLine): string {
  if (line.kind === 'labour' || line.kind === 'core') return ''
  if (line.toOrder) return 'order'
  const place = [line.site, line.location].filter(Boolean).join(', ')
  const condition = line.condition ? CONDITION[line.condition] : ''
  return [place, condition].filter(Boolean).join(' · ')
}

/** Labour in hours and minutes, everything else as a count. */
export function lineQuantity(line: QuoteLine, options: FormatOptions = {}): string {
  if (line.minutes !== undefined) return formatDuration(line.minutes, options)
  return Number.isInteger(line.quantity) ? formatCount(line.quantity, options) : String(line.quantity)
}

/** A line to order with no price is priced on request, never shown as free. */
export function linePrice(line: QuoteLine, currency: string, options: FormatOptions = {}): { unit: string; total: string } {
  if (line.toOrder && line.unitPriceCents === 0) return { unit: 'on request', total: 'on request' }
  const unit = formatMoney(line.unitPriceCents, currency, options)
  return { unit: line.kind === 'labour' ? `${unit} / h` : unit, total: formatMoney(lineCents(line), currency, options) }
}

/** Whether some line still has no price, so the total is for the priced lines only. */
export function hasUnpricedLines(lines: readonly QuoteLine[]): boolean {
  return lines.some((line) => line.toOrder && line.unitPriceCents === 0)
}
