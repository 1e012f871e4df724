import { setImmediate as nextTurn } from 'node:timers/promises'
import { NO_STOCK, STOCK_CONDITIONS, type Availability, type StockCondition } from '../../shared/schemas/stock'
import type { AvailableRow, StockRepository } from './stock.repository'

type Summary = { available: number; best: number; min: number; max: number; sites: Set<number> }

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

  of(partId: number): Availability {
    const summary = this.byPart.get(partId)
    if (!summary) return NO_STOCK
    return {
      available: summary.available,
      bestCondition: STOCK_CONDITIONS[summary.best] ?? null,
      minPriceCents: summary.min,
      maxPriceCents: summary.max,
      sites: [...summary.sites].map((id) => this.siteNames.get(id) ?? `site ${id}`).sort(),
    }
  }

  private add(row: AvailableRow) {
    const rank = RANK.get(row.condition) ?? STOCK_CONDITIONS.length
    const summary = this.byPart.get(row.partId)
    if (!summary) {
      this.byPart.set(row.partId, { available: 1, best: rank, min: row.priceCents, max: row.priceCents, sites: new Set([row.siteId]) })
      return
    }
    summary.available++
    summary.best = Math.min(summary.best, rank)
    summary.min = Math.min(summary.min, row.priceCents)
    summary.max = Math.max(summary.max, row.priceCents)
    summary.sites.add(row.siteId)
  }
}
