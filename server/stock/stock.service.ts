import type { Site, SiteInput, StockInput, StockItem, StockList, StockUpdate } from '../../shared/schemas/stock'
import type { StockStatus } from '../../shared/schemas/stock'
import { toIsoTime } from '../db/database'
import { AppError } from '../errors/app-error'
import type { PartService } from '../catalogue/part.service'
import type { StockIndex } from './stock-index'
import type { SiteRow, StockRepository, StockRow } from './stock.repository'

function isUniqueViolation(error: unknown): boolean {
  const text = error instanceof Error ? error.message : ''
  return /UNIQUE constraint|duplicate key/i.test(text)
}

/** Sites and the units on their shelves. */
export class StockService {
  constructor(
    private readonly repository: StockRepository,
    private readonly parts: PartService,
    private readonly index: StockIndex,
  ) {}

  async sites(): Promise<Site[]> {
    return this.repository.sites()
  }

  async createSite(input: SiteInput): Promise<Site> {
    try {
      const id = await this.repository.insertSite(input.name, input.address)
      await this.index.refreshSites()
      return { id, ...input }
    } catch (error) {
      if (isUniqueViolation(error))
        throw AppError.conflict(`A site named "${input.name}" exists already.`, [{ path: 'name', message: 'Choose another name.' }])
      throw error
    }
  }

  async list(query: { part?: string; site?: string; status?: StockStatus; page: number; pageSize: number }): Promise<StockList> {
    const partId = query.part ? await this.parts.requireId(query.part, 'part') : undefined
    const siteId = query.site ? (await this.requireSite(query.site, 'site')).id : undefined
    const { rows, total } = await this.repository.page(
      { partId, siteId, status: query.status },
      (query.page - 1) * query.pageSize,
      query.pageSize,
    )
    const sites = await this.siteMap()
    return { items: rows.map((row) => toItem(row, sites)), total }
  }

  async get(id: number): Promise<StockItem> {
    const row = await this.repository.item(id)
    if (!row) throw AppError.notFound(`No stock item ${id}.`)
    return toItem(row, await this.siteMap())
  }

  async byLabel(label: string): Promise<StockItem> {
    const row = await this.repository.byLabel(label)
    if (!row) throw AppError.notFound(`No stock item labelled "${label}".`)
    return toItem(row, await this.siteMap())
  }

  async create(input: StockInput): Promise<StockItem> {
    const partId = await this.parts.requireId(input.partNumber, 'partNumber')
    const site = await this.requireSite(input.site, 'site')
    const { partNumber: _partNumber, site: _site, ...fields } = input
    let id: number
    try {
      id = await this.repository.insertItem(partId, site.id, fields)
    } catch (error) {
      if (isUniqueViolation(error))
        throw AppError.conflict(`The label "${input.label}" is on another unit already.`, [
          { path: 'label', message: 'Use another label.' },
        ])
      throw error
    }
    await this.index.refresh([partId])
    return this.get(id)
  }

  async update(id: number, change: StockUpdate): Promise<StockItem> {
    const current = await this.repository.item(id)
    if (!current) throw AppError.notFound(`No stock item ${id}.`)
    if (change.grade && current.condition !== 'used')
      throw AppError.badRequest('Only used parts carry a grade.', [{ path: 'grade', message: 'Only used parts carry a grade.' }])
    const { site, ...rest } = change
    const siteId = site ? (await this.requireSite(site, 'site')).id : undefined
    await this.repository.updateItem(id, { ...rest, siteId })
    await this.index.refresh([current.partId])
    return this.get(id)
  }

  /** Puts units whose reservation ran out back on the shelf (run on the server's beat). */
  async releaseExpired(now = new Date()): Promise<number> {
    const partIds = await this.repository.releaseExpired(now)
    if (partIds.length) await this.index.refresh(partIds)
    return partIds.length
  }

  private async requireSite(name: string, path: string): Promise<SiteRow> {
    const site = await this.repository.siteByName(name)
    if (!site) throw AppError.badRequest(`No site named "${name}".`, [{ path, message: `No site named "${name}"; add it first.` }])
    return site
  }

  private async siteMap(): Promise<Map<number, SiteRow>> {
    return new Map((await this.repository.sites()).map((site) => [site.id, site]))
  }
}

function toItem(row: StockRow, sites: Map<number, SiteRow>): StockItem {
  const site = sites.get(row.siteId) ?? { id: row.siteId, name: `site ${row.siteId}`, address: '' }
  return {
    id: row.id,
    partNumber: row.partNumber,
    site,
    condition: row.condition,
    grade: row.grade,
    mileageKm: row.mileageKm,
    donorVin: row.donorVin,
    donorYear: row.donorYear,
    damageNotes: row.damageNotes,
    location: row.location,
    priceCents: row.priceCents,
    coreChargeCents: row.coreChargeCents,
    status: row.status,
    label: row.label,
    updatedAt: toIsoTime(row.updatedAt),
  }
}
