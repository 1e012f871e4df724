import type { StockCondition, StockInput, StockStatus, StockUpdate } from '../../shared/schemas/stock'
import { chunks, placeholders, type Database } from '../db/database'

export type SiteRow = { id: number; name: string; address: string }
export type StockRow = {
  id: number
  partId: number
  partNumber: string
  siteId: number
  condition: StockCondition
  grade: 'A' | 'B' | 'C' | null
  mileageKm: number | null
  donorVin: string | null
  donorYear: number | null
  damageNotes: string
  location: string
  priceCents: number
  coreChargeCents: number
  status: StockStatus
  label: string | null
  updatedAt: unknown
}
export type UnitRow = {
  id: number
  partId: number
  partNumber: string
  siteId: number
  condition: StockCondition
  priceCents: number
  coreChargeCents: number
  location: string
}
export type AvailableRow = { partId: number; siteId: number; condition: StockCondition; priceCents: number }

const STOCK_COLUMNS = `SELECT s."id", s."partId", p."partNumber", s."siteId", s."condition", s."grade", s."mileageKm", s."donorVin", s."donorYear",
  s."damageNotes", s."location", s."priceCents", s."coreChargeCents", s."status", s."label", s."updatedAt"
  FROM stock_item s JOIN part p ON p."id" = s."partId"`
const AVAILABLE = `SELECT "partId", "siteId", "condition", "priceCents" FROM stock_item WHERE "status" = 'available'`

/** The site and stock_item tables. */
export class StockRepository {
  constructor(private readonly db: Database) {}

  sites(): Promise<SiteRow[]> {
    return this.db.all<SiteRow>('SELECT "id", "name", "address" FROM site ORDER BY "name"')
  }

  siteByName(name: string): Promise<SiteRow | undefined> {
    return this.db.get<SiteRow>('SELECT "id", "name", "address" FROM site WHERE "name" = ?', [name])
  }

  insertSite(name: string, address: string): Promise<number> {
    return this.db.insert('INSERT INTO site ("name", "address", "createdAt") VALUES (?, ?, ?) RETURNING "id"', [name, address, new Date()])
  }

  insertItem(partId: number, siteId: number, item: Omit<StockInput, 'partNumber' | 'site'>): Promise<number> {
    const now = new Date()
    return this.db.insert(
      `INSERT INTO stock_item ("partId", "siteId", "condition", "grade", "mileageKm", "donorVin", "donorYear", "damageNotes", "location",
         "priceCents", "coreChargeCents", "status", "label", "createdAt", "updatedAt") VALUES (?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?) RETURNING "id"`,
      [
        partId,
        siteId,
        item.condition,
        item.grade,
        item.mileageKm,
        item.donorVin,
        item.donorYear,
        item.damageNotes,
        item.location,
        item.priceCents,
        item.coreChargeCents,
        item.status,
        item.label,
        now,
        now,
      ],
    )
  }

  async updateItem(id: number, change: Omit<StockUpdate, 'site'> & { siteId?: number }): Promise<number> {
    const columns = Object.entries(change).filter(([, value]) => value !== undefined)
    const sets = columns.map(([column]) => `"${column}" = ?`)
    const { changes } = await this.db.run(`UPDATE stock_item SET ${[...sets, '"updatedAt" = ?'].join(', ')} WHERE "id" = ?`, [
      ...columns.map(([, value]) => value as string | number | null),
      new Date(),
      id,
    ])
    return changes
  }

  item(id: number): Promise<StockRow | undefined> {
    return this.db.get<StockRow>(`${STOCK_COLUMNS} WHERE s."id" = ?`, [id])
  }

  byLabel(label: string): Promise<StockRow | undefined> {
    return this.db.get<StockRow>(`${STOCK_COLUMNS} WHERE s."label" = ?`, [label])
  }

  async page(filter: { partId?: number; siteId?: number; status?: StockStatus }, offset: number, limit: number) {
    const where: string[] = []
    const params: (string | number)[] = []
    const add = (condition: string, value: string | number) => {
      where.push(condition)
      params.push(value)
    }
    if (filter.partId !== undefined) add('s."partId" = ?', filter.partId)
    if (filter.siteId !== undefined) add('s."siteId" = ?', filter.siteId)
    if (filter.status) add('s."status" = ?', filter.status)
    const clause = where.length ? ` WHERE ${where.join(' AND ')}` : ''
    const rows = await this.db.all<StockRow>(`${STOCK_COLUMNS}${clause} ORDER BY s."id" DESC LIMIT ? OFFSET ?`, [...params, limit, offset])
    const total = await this.db.get<{ total: number }>(`SELECT CAST(COUNT(*) AS INTEGER) AS "total" FROM stock_item s${clause}`, params)
    return { rows, total: total?.total ?? 0 }
  }

  /** Available units in id order, a page at a time (loading the index at start-up). */
  availablePage(after: number, limit: number): Promise<(AvailableRow & { id: number })[]> {
    return this.db.all(
      `SELECT "id", "partId", "siteId", "condition", "priceCents" FROM stock_item WHERE "status" = 'available' AND "id" > ? ORDER BY "id" LIMIT ?`,
      [after, limit],
    )
  }

  async availableOf(partIds: readonly number[]): Promise<AvailableRow[]> {
    const rows: AvailableRow[] = []
    for (const ids of chunks(partIds))
      rows.push(...(await this.db.all<AvailableRow>(`${AVAILABLE} AND "partId" IN (${placeholders(ids.length)})`, ids)))
    return rows
  }

  /** Available units of these part numbers, for pricing a quote. */
  async unitsOf(partNumbers: readonly string[]): Promise<UnitRow[]> {
    const rows: UnitRow[] = []
    for (const numbers of chunks([...new Set(partNumbers)])) {
      rows.push(
        ...(await this.db.all<UnitRow>(
          `SELECT s."id", s."partId", p."partNumber", s."siteId", s."condition", s."priceCents", s."coreChargeCents", s."location"
             FROM stock_item s JOIN part p ON p."id" = s."partId" WHERE s."status" = 'available' AND p."partNumber" IN (${placeholders(numbers.length)})`,
          numbers,
        )),
      )
    }
    return rows
  }

  /** Reservations past their time go back on the shelf; answers the parts they were of. */
  releaseExpired(now: Date): Promise<number[]> {
    return this.db.transaction(async (tx) => {
      const rows = await tx.all<{ partId: number }>(
        `SELECT DISTINCT "partId" FROM stock_item WHERE "status" = 'reserved' AND "reservedUntil" < ?`,
        [now],
      )
      if (rows.length) {
        await tx.run(
          `UPDATE stock_item SET "status" = 'available', "reservedUntil" = NULL, "updatedAt" = ? WHERE "status" = 'reserved' AND "reservedUntil" < ?`,
          [now, now],
        )
      }
      return rows.map((row) => row.partId)
    })
  }
}
