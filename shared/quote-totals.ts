/**
 * Quote arithmetic in integer cents: every line is quantity × unit price,
 * rounded to the cent once per line; tax is charged on the sum of the lines
 * and rounded half up to the cent once. No floating-point money anywhere.
 */
export type QuoteLineKind = 'part' | 'consumable' | 'labour' | 'core'
/** Labour is priced from its minutes (the hourly rate × minutes ÷ 60), so 20 minutes is exactly a third of the rate. */
export type PricedLine = { kind: QuoteLineKind; quantity: number; unitPriceCents: number; minutes?: number }
export type QuoteTotals = { partsCents: number; labourCents: number; coreCents: number; taxCents: number; totalCents: number }

/** Quantities may be fractional (1.5 hours of labour); the line is rounded half up to the cent. */
export function lineCents(line: PricedLine): number {
  if (line.minutes !== undefined) return Math.floor((line.minutes * line.unitPriceCents + 30) / 60)
  // Work in thousandths of a unit so 1.5 h × 8,450 ¢ stays exact before the one rounding.
  const milli = Math.round(line.quantity * 1000)
  return Math.floor((milli * line.unitPriceCents + 500) / 1000)
}

/** Tax rate in basis points (20 % = 2000), so a rate like 8.25 % stays exact. */
export function quoteTotals(lines: readonly PricedLine[], taxRateBasisPoints: number): QuoteTotals {
  let partsCents = 0
  let labourCents = 0
  let coreCents = 0
  for (const line of lines) {
    const cents = lineCents(line)
    if (line.kind === 'labour') labourCents += cents
    else if (line.kind === 'core') coreCents += cents
    else partsCents += cents
  }
  const taxable = partsCents + labourCents + coreCents
  const taxCents = Math.floor((taxable * taxRateBasisPoints + 5000) / 10000)
  return { partsCents, labourCents, coreCents, taxCents, totalCents: taxable + taxCents }
}
