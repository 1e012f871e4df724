import type { PartsListLine } from '../../shared/schemas/build'
import type { StockRepository } from './stock.repository'
import { unitsToTake } from './units-to-take'

/**
 * A parts list with, on each line that has a part number, the units to take
 * (site, shelf, condition, price) and how many to order: the same choice a
 * quote makes, so the planner's sheet and the quote agree.
 */
export class PartsListShelf {
  constructor(private readonly repository: Pick<StockRepository, 'unitsOf' | 'sites'>) {}

  /** `homeSiteId`: the asker's own site, whose unit is taken first among equal conditions. */
  async withUnits(lines: PartsListLine[], homeSiteId: number | null = null): Promise<PartsListLine[]> {
    const numbers = lines.flatMap((line) => (line.partNumber ? [line.partNumber] : []))
    if (numbers.length === 0) return lines
    const units = await this.repository.unitsOf(numbers)
    const sites = new Map((await this.repository.sites()).map((site) => [site.id, site.name]))
    const picks = unitsToTake(lines, (partNumber) => units.filter((unit) => unit.partNumber === partNumber), homeSiteId)
    return lines.map((line, index) => {
      if (!line.partNumber) return line
      const { units: taken, toOrder } = picks[index]!
      return {
        ...line,
        shelf: {
          take: taken.map((unit) => ({
            stockItemId: unit.id,
            site: sites.get(unit.siteId) ?? `site ${unit.siteId}`,
            location: unit.location,
            condition: unit.condition,
            priceCents: unit.priceCents,
          })),
          toOrder,
        },
      }
    })
  }
}
