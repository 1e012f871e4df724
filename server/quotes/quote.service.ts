import type { User } from '../../shared/schemas/auth'
import type { EvaluateRequest } from '../../shared/schemas/build'
import type { Quote, QuoteRequest, QuoteSummary } from '../../shared/schemas/quotes'
import { quoteTotals } from '../../shared/quote-totals'
import { toIsoTime, type Database } from '../db/database'
import { AppError } from '../errors/app-error'
import type { BuildEvaluationService } from '../builds/build-evaluation.service'
import type { BuildSheetService } from '../builds/build-sheet.service'
import type { PartRepository } from '../catalogue/part.repository'
import type { ShopSettingsService } from '../settings/shop-settings.service'
import type { StockIndex } from '../stock/stock-index'
import type { StockRepository } from '../stock/stock.repository'
import { quoteLines } from './quote-lines'

type QuoteRow = {
  id: number
  status: 'draft' | 'accepted'
  customer: string
  buildSheetId: number | null
  body: string
  createdByName: string
  reservedUntil: unknown
  createdAt: unknown
}
type Body = Pick<Quote, 'shop' | 'vehicle' | 'lines' | 'totals' | 'cautions'> & { buildName?: string | null }

/** The newest quotes a list shows; older ones stay reachable by their number. */
const LIST_LIMIT = 200

const COLUMNS = 'SELECT "id", "status", "customer", "buildSheetId", "body", "createdByName", "reservedUntil", "createdAt" FROM quote'

function toQuote(row: QuoteRow): Quote {
  const body = JSON.parse(row.body) as Body
  return {
    id: row.id,
    status: row.status,
    customer: row.customer,
    buildSheetId: row.buildSheetId,
    ...body,
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
    const body: Body = {
      buildName,
      shop,
      vehicle: { modelYear: build.chassisModelYear ?? null, vin: build.vin ?? null },
      lines,
      totals: quoteTotals(lines, shop.taxRateBasisPoints),
      cautions: evaluation.cautions,
    }
    const id = await this.db.insert(
      'INSERT INTO quote ("status", "customer", "buildSheetId", "body", "createdByName", "createdAt") VALUES (\'draft\', ?, ?, ?, ?, ?) RETURNING "id"',
      [request.customer, buildSheetId, JSON.stringify(body), user.name, new Date()],
    )
    return this.get(id)
  }

  async list(): Promise<QuoteSummary[]> {
    const rows = await this.db.all<QuoteRow>(`${COLUMNS} ORDER BY "id" DESC LIMIT ${LIST_LIMIT}`)
    return rows.map((row) => {
      const quote = toQuote(row)
      return {
        id: quote.id,
        status: quote.status,
        customer: quote.customer,
        buildName: quote.buildName,
        totalCents: quote.totals.totalCents,
        currency: quote.shop.currency,
        createdBy: quote.createdBy,
        createdAt: quote.createdAt,
        reservedUntil: quote.reservedUntil,
      }
    })
  }

  async get(id: number): Promise<Quote> {
    const row = await this.db.get<QuoteRow>(`${COLUMNS} WHERE "id" = ?`, [id])
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
        build: {
          slots: sheet.slots,
          targetPowerKw: sheet.targetPowerKw ?? undefined,
          fuelOctane: sheet.fuelOctane ?? undefined,
          chassisModelYear: sheet.chassisModelYear ?? undefined,
          vin: sheet.vin ?? undefined,
        },
      }
    }
    const { customer: _customer, ...build } = request
    return { build, buildSheetId: null, buildName: null }
  }
}
