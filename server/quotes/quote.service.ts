import type { User } from '../../shared/schemas/auth'
import { sheetContext, type EvaluateRequest } from '../../shared/schemas/build'
import type { Quote, QuoteList, QuoteListQuery, QuoteRequest, QuoteVehicle } from '../../shared/schemas/quotes'
import { quoteTotals } from '../../shared/quote-totals'
import { toIsoTime, type Database } from '../db/database'
import { AppError } from '../errors/app-error'
import type { BuildEvaluationService } from '../builds/build-evaluation.service'
import type { BuildSheetService } from '../builds/build-sheet.service'
import type { PartRepository } from '../catalogue/part.repository'
import type { ShopSettingsService } from '../settings/shop-settings.service'
import type { StockIndex } from '../stock/stock-index'
import type { StockRepository } from '../stock/stock.repository'
import type { VehicleService } from '../vehicles/vehicle.service'
import { quoteLines } from './quote-lines'
import type { QuoteRepository, QuoteRow } from './quote.repository'
import { quoteSearchText, quoteVehicle } from './quote-vehicle'

type Body = Pick<Quote, 'shop' | 'lines' | 'totals' | 'cautions'> & {
  buildName?: string | null
  /** Quotes made before make and model were kept have only the model year and VIN. */
  vehicle: Partial<QuoteVehicle> & Pick<QuoteVehicle, 'modelYear' | 'vin'>
}

function toQuote(row: QuoteRow): Quote {
  const body = JSON.parse(row.body) as Body
  return {
    id: row.id,
    status: row.status,
    customer: row.customer,
    buildSheetId: row.buildSheetId,
    ...body,
    vehicle: { make: null, model: null, engineFamily: null, ...body.vehicle },
    buildName: body.buildName ?? null,
    createdBy: row.createdByName,
    createdAt: toIsoTime(row.createdAt),
    reservedUntil: row.reservedUntil ? toIsoTime(row.reservedUntil) : null,
  }
}

/** Quotes for a whole job: priced from the shelf and the shop's rates, accepted by reserving the units. */
export class QuoteService {
  constructor(
    private readonly db: Database,
    private readonly evaluation: BuildEvaluationService,
    private readonly sheets: BuildSheetService,
    private readonly shop: ShopSettingsService,
    private readonly stock: StockRepository,
    private readonly stockIndex: StockIndex,
    private readonly parts: PartRepository,
    private readonly quotes: QuoteRepository,
    private readonly vehicles: Pick<VehicleService, 'get' | 'byVin'>,
  ) {}

  async create(request: QuoteRequest, user: User): Promise<Quote> {
    const { build, buildSheetId, buildName } = await this.buildOf(request, user)
    const evaluation = await this.evaluation.evaluate(build, user)
    const shop = await this.shop.get()
    const units = await this.stock.unitsOf(evaluation.partsList.flatMap((line) => (line.partNumber ? [line.partNumber] : [])))
    const sites = new Map((await this.stock.sites()).map((site) => [site.id, site.name]))
    const listPrices = await this.parts.listPrices(evaluation.partsList.flatMap((line) => (line.partNumber ? [line.partNumber] : [])))
    const lines = quoteLines(evaluation, build.slots, shop, {
      unitsOf: (partNumber) => units.filter((unit) => unit.partNumber === partNumber),
      siteName: (siteId) => sites.get(siteId) ?? `site ${siteId}`,
      listPriceOf: (partNumber) => listPrices.get(partNumber) ?? null,
      homeSiteId: user.homeSiteId,
    })
    const vehicle = await quoteVehicle(build, this.vehicles)
    const body: Body = {
      buildName,
      shop,
      vehicle,
      lines,
      totals: quoteTotals(lines, shop.taxRateBasisPoints),
      cautions: evaluation.cautions,
    }
    const id = await this.quotes.insert(
      {
        customer: request.customer,
        buildSheetId,
        body: JSON.stringify(body),
        searchText: quoteSearchText(request.customer, vehicle),
        createdByName: user.name,
      },
      lines.flatMap((line) => (line.stockItemId ? [line.stockItemId] : [])),
    )
    return this.get(id)
  }

  /** A page of the quotes a search finds (customer, job number, VIN, make, model), newest first. */
  async list(query: QuoteListQuery): Promise<QuoteList> {
    const { rows, total } = await this.quotes.page(query)
    const items = rows.map((row) => {
      const quote = toQuote(row)
      return {
        id: quote.id,
        status: quote.status,
        customer: quote.customer,
        buildName: quote.buildName,
        vehicle: quote.vehicle,
        totalCents: quote.totals.totalCents,
        currency: quote.shop.currency,
        createdBy: quote.createdBy,
        createdAt: quote.createdAt,
        reservedUntil: quote.reservedUntil,
      }
    })
    return { items, total, page: query.page, pageSize: query.pageSize }
  }

  async get(id: number): Promise<Quote> {
    const row = await this.quotes.byId(id)
    if (!row) throw AppError.notFound(`No quote ${id}.`)
    return toQuote(row)
  }

  /**
   * Reserves every unit the quote takes, all or none: a unit another quote
   * took meanwhile (or sold) makes it a 409 and nothing is reserved.
   */
  async accept(id: number): Promise<Quote> {
    const quote = await this.get(id)
    if (quote.status === 'accepted') throw AppError.conflict(`Quote ${id} is accepted already.`)
    const until = new Date(Date.now() + quote.shop.reservationHours * 3_600_000)
    const unitIds = quote.lines.flatMap((line) => (line.stockItemId ? [line.stockItemId] : []))
    const partIds = await this.db.transaction(async (tx) => {
      const touched: number[] = []
      for (const unitId of unitIds) {
        const { changes } = await tx.run(
          `UPDATE stock_item SET "status" = 'reserved', "reservedUntil" = ?, "updatedAt" = ? WHERE "id" = ? AND "status" = 'available'`,
          [until, new Date(), unitId],
        )
        const line = quote.lines.find((l) => l.stockItemId === unitId)!
        if (changes === 0)
          throw AppError.conflict(
            `The unit of ${line.partNumber} at ${line.site} (${line.location}) is gone since the quote was made; make a new quote.`,
          )
        const part = await tx.get<{ partId: number }>('SELECT "partId" FROM stock_item WHERE "id" = ?', [unitId])
        if (part) touched.push(part.partId)
      }
      const { changes } = await tx.run(
        `UPDATE quote SET "status" = 'accepted', "reservedUntil" = ? WHERE "id" = ? AND "status" = 'draft'`,
        [until, id],
      )
      if (changes === 0) throw AppError.conflict(`Quote ${id} was accepted meanwhile.`)
      return touched
    })
    await this.stockIndex.refresh(partIds)
    return this.get(id)
  }

  private async buildOf(
    request: QuoteRequest,
    user: User,
  ): Promise<{ build: EvaluateRequest; buildSheetId: number | null; buildName: string | null }> {
    if ('buildSheetId' in request) {
      const sheet = await this.sheets.get(request.buildSheetId, user)
      return {
        buildSheetId: sheet.id,
        buildName: sheet.name,
        build: { slots: sheet.slots, ...sheetContext(sheet) },
      }
    }
    const { customer: _customer, ...build } = request
    return { build, buildSheetId: null, buildName: null }
  }
}
