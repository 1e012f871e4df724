import { setImmediate as nextTurn } from 'node:timers/promises'
import { NO_STOCK, STOCK_CONDITIONS, type Availability, type StockCondition } from '../../shared/schemas/stock'
import type { AvailableRow, StockRepository } from './stock.repository'

/** Available units of one part; `sites` counts them by site id. */
type Summary = { available: number; best: number; min: number; max: number; sites: Map<number, number> }

/** Lower is better: new, then remanufactured, used, and a core last. */
const RANK = new Map<StockCondition, number>(STOCK_CONDITIONS.map((condition, index) => [condition, index]))
const PAGE = 20_000

/**
 * What is on the shelf, per part, in memory: loaded once a page at a time,
 * then kept current by re-reading the parts a stock write touched. Answers
 * "is it in stock" for a whole what-fits group without a query per line.
 */
export class StockIndex {
  private readonly byPart = new Map<number, Summary>()
  private siteNames = new Map<number, string>()
  private loaded: Promise<void> | null = null

  constructor(private readonly repository: StockRepository) {}

  load(): Promise<void> {
    this.loaded ??= (async () => {
      await this.refreshSites()
      for (let after = 0; ;) {
        const rows = await this.repository.availablePage(after, PAGE)
        for (const row of rows) this.add(row)
        if (rows.length < PAGE) break
        after = rows[rows.length - 1]!.id
        await nextTurn()
      }
    })()
    return this.loaded
  }

  /** After a write: the parts it touched are read again. */
  async refresh(partIds: readonly number[]): Promise<void> {
    await this.load()
    const rows = await this.repository.availableOf([...new Set(partIds)])
    for (const id of partIds) this.byPart.delete(id)
    for (const row of rows) this.add(row)
  }

  async refreshSites(): Promise<void> {
    this.siteNames = new Map((await this.repository.sites()).map((site) => [site.id, site.name]))
  }

  has(partId: number): boolean {
    return this.byPart.has(partId)
  }

  /**
   * The shelf for one part as the asker sees it: their home site first when it
   * holds a unit, else the site with the most. Ordered here, per answer, from
   * the few sites a part sits at, so nothing is read per line.
   */
  of(partId: number, homeSiteId: number | null = null): Availability {
    const summary = this.byPart.get(partId)
    if (!summary) return NO_STOCK
    const nearest = nearestOf(summary.sites, homeSiteId, (id) => this.siteName(id))
    const others = [...summary.sites.keys()].filter((id) => id !== nearest).map((id) => this.siteName(id))
    const nearestName = this.siteName(nearest)
    return {
      available: summary.available,
      bestCondition: STOCK_CONDITIONS[summary.best] ?? null,
      minPriceCents: summary.min,
      maxPriceCents: summary.max,
      sites: [nearestName, ...others.sort()],
      nearestSite: nearestName,
    }
  }

  private siteName(id: number): string {
    return this.siteNames.get(id) ?? `site ${id}`
  }

  private add(row: AvailableRow) {
    const rank = RANK.get(row.condition) ?? STOCK_CONDITIONS.length
    const summary = this.byPart.get(row.partId)
    if (!summary) {
      this.byPart.set(row.partId, { available: 1, best: rank, min: row.priceCents, max: row.priceCents, sites: new Map([[row.siteId, 1]]) })
      return
    }
    summary.available++
    summary.best = Math.min(summary.best, rank)
    summary.min = Math.min(summary.min, row.priceCents)
    summary.max = Math.max(summary.max, row.priceCents)
    summary.sites.set(row.siteId, (summary.sites.get(row.siteId) ?? 0) + 1)
  }
}

/** The home site when it holds a unit; otherwise the site holding the most, ties going to the first name. */
function nearestOf(counts: ReadonlyMap<number, number>, homeSiteId: number | null, nameOf: (id: number) => string): number {
  if (homeSiteId !== null && (counts.get(homeSiteId) ?? 0) > 0) return homeSiteId
  let best: number | null = null
  for (const [id, count] of counts) {
    const lead = best === null ? 0 : count - counts.get(best)!
    if (best === null || lead > 0 || (lead === 0 && nameOf(id).localeCompare(nameOf(best)) < 0)) best = id
  }
  return best!
}
