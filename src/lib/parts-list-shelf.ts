import type { PartsListLine, ShelfUnit } from '@shared/schemas/build'
import { centsToDecimal } from '@shared/money'
import { formatCents } from '@/lib/format'

const CONDITION: Record<ShelfUnit['condition'], string> = { new: 'new', remanufactured: 'reman.', used: 'used', core: 'core' }

/** One unit to take, as a counter looks for it: site, shelf, condition, price. */
export function shelfUnitText(unit: ShelfUnit, money: (cents: number) => string = (cents) => formatCents(cents)): string {
  return [unit.site, unit.location || 'no shelf given', CONDITION[unit.condition], money(unit.priceCents)].join(' · ')
}

/** What is left to order on a line: "order" when the shelf has none, "order 3 more" beside units taken; null when nothing is. */
export function toOrderText(line: PartsListLine): string | null {
  if (!line.shelf || line.shelf.toOrder <= 0) return null
  return line.shelf.take.length ? `order ${line.shelf.toOrder} more` : 'order'
}

/** The shelf cell of the CSV: the units to take and what to order, in plain decimals whatever the browser's locale. */
export function shelfCsvText(line: PartsListLine): string {
  if (!line.shelf) return ''
  const order = toOrderText(line)
  return [...line.shelf.take.map((unit) => shelfUnitText(unit, centsToDecimal)), ...(order ? [order] : [])].join('; ')
}
