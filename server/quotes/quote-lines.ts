import { BUILD_SLOTS } from '../../shared/build-template'
import type { Evaluation } from '../../shared/schemas/build'
import type { QuoteLine, ShopSettings } from '../../shared/schemas/quotes'
import type { UnitRow } from '../stock/stock.repository'
import { unitsToTake } from '../stock/units-to-take'

const GROUP_OF = new Map<string, string>(BUILD_SLOTS.map((slot) => [slot.id, slot.group]))
/** What the shop has and charges: the units on its shelves, its sites' names, and the list price of a part to order. */
export type Shelf = {
  unitsOf: (partNumber: string) => UnitRow[]
  siteName: (siteId: number) => string
  listPriceOf: (partNumber: string) => number | null
  /** The quoting user's own site, whose unit is taken first among equal conditions. */
  homeSiteId?: number | null
}

/**
 * The lines of a quote: each part from the parts list with the unit to take
 * (site, shelf, condition, price) or "to order" at the part's list price (no
 * price when it has none), a core charge where the unit carries one, the
 * consumables, and labour for the job at the shop's rate.
 */
export function quoteLines(evaluation: Evaluation, slots: Record<string, unknown>, shop: ShopSettings, shelf: Shelf): QuoteLine[] {
  const { unitsOf, siteName, listPriceOf } = shelf
  const lines: QuoteLine[] = []
  const picks = unitsToTake(evaluation.partsList, unitsOf, shelf.homeSiteId ?? null)
  evaluation.partsList.forEach((item, index) => {
    if (!item.partNumber) {
      lines.push({ kind: 'consumable', description: item.description, quantity: item.quantity, unitPriceCents: 0, toOrder: true })
      return
    }
    const { units, toOrder: left } = picks[index]!
    for (const unit of units) {
      lines.push({
        kind: 'part',
        partNumber: item.partNumber,
        description: item.description,
        quantity: 1,
        unitPriceCents: unit.priceCents,
        toOrder: false,
        stockItemId: unit.id,
        condition: unit.condition,
        site: siteName(unit.siteId),
        location: unit.location,
      })
      if (unit.coreChargeCents > 0) {
        lines.push({
          kind: 'core',
          partNumber: item.partNumber,
          description: `Core charge, ${item.partNumber} (refunded when the old part comes back)`,
          quantity: 1,
          unitPriceCents: unit.coreChargeCents,
          toOrder: false,
        })
      }
    }
    if (left > 0) {
      lines.push({
        kind: item.category === 'consumable' ? 'consumable' : 'part',
        partNumber: item.partNumber,
        description: item.description,
        quantity: left,
        unitPriceCents: listPriceOf(item.partNumber) ?? 0,
        toOrder: true,
      })
    }
  })
  const groups = new Set(
    Object.keys(slots)
      .map((slot) => GROUP_OF.get(slot))
      .filter(Boolean),
  )
  const baseMinutes = groups.size * shop.baseMinutesPerGroup
  if (baseMinutes > 0) {
    lines.push({
      kind: 'labour',
      description: `Base job time, ${groups.size} assembly group${groups.size === 1 ? '' : 's'}`,
      quantity: baseMinutes / 60,
      minutes: baseMinutes,
      unitPriceCents: shop.labourRateCents,
      toOrder: false,
    })
  }
  for (const modification of evaluation.modifications) {
    if (!modification.timeMinutes) continue
    lines.push({
      kind: 'labour',
      description: modification.title,
      quantity: modification.timeMinutes / 60,
      minutes: modification.timeMinutes,
      unitPriceCents: shop.labourRateCents,
      toOrder: false,
    })
  }
  return lines
}
