import type { PartsListLine } from '../../shared/schemas/build'
import { STOCK_CONDITIONS } from '../../shared/schemas/stock'
import type { UnitRow } from './stock.repository'

const RANK = new Map<string, number>(STOCK_CONDITIONS.map((condition, index) => [condition, index]))

/**
 * Best condition first, then a unit at the home site (no trip to another
 * lot), then the cheaper one: what a counter would pull off the shelf.
 */
export function unitOrder(homeSiteId: number | null = null): (a: UnitRow, b: UnitRow) => number {
  const away = (unit: UnitRow) => (homeSiteId !== null && unit.siteId === homeSiteId ? 0 : 1)
  return (a, b) =>
    (RANK.get(a.condition) ?? 9) - (RANK.get(b.condition) ?? 9) || away(a) - away(b) || a.priceCents - b.priceCents || a.id - b.id
}

/** For one line of a parts list: the units to take off the shelf and how many are left to order. */
export type LineUnits = { units: UnitRow[]; toOrder: number }

/**
 * The units to take for each line of a parts list, line by line: one unit
 * per whole piece, the best first, a unit never taken twice; what the shelf
 * cannot cover (or a quantity that is not whole pieces) is to order; cores
 * are never taken. Lines
 * without a part number take nothing and order nothing here.
 */
export function unitsToTake(
  lines: readonly PartsListLine[],
  unitsOf: (partNumber: string) => UnitRow[],
  homeSiteId: number | null = null,
): LineUnits[] {
  const taken = new Set<number>()
  const order = unitOrder(homeSiteId)
  return lines.map((line) => {
    if (!line.partNumber) return { units: [], toOrder: 0 }
    const wholeUnits = Number.isInteger(line.quantity) ? line.quantity : 0
    // A core is a worn unit kept for exchange or rebuilding, never a part to fit.
    const units = unitsOf(line.partNumber)
      .filter((unit) => unit.condition !== 'core' && !taken.has(unit.id))
      .sort(order)
      .slice(0, Math.max(0, wholeUnits))
    for (const unit of units) taken.add(unit.id)
    return { units, toOrder: line.quantity - units.length }
  })
}
