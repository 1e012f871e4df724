import type { Database } from '../../db/database'
import { STOCK_COLUMNS } from '../../../shared/import-files'
import { toCsv } from '../../../shared/csv-cells'
import { stockCells, type StockUnit } from './stock-cells'

/** Every unit on every shelf, in the stock import format (sold ones too: the file is the stock book). */
export async function stockCsv(db: Database): Promise<string> {
  const units = await db.all<StockUnit>(
    `SELECT p."partNumber", t."name" AS "site", s."condition", s."grade", s."priceCents", s."coreChargeCents", s."location", s."mileageKm",
         s."donorVin", s."donorYear", s."status", s."damageNotes", s."label"
       FROM stock_item s JOIN part p ON p."id" = s."partId" JOIN site t ON t."id" = s."siteId" ORDER BY t."name", s."id"`,
  )
  return toCsv([
    [...STOCK_COLUMNS],
    ...units.map((unit) => {
      const cells = stockCells(unit)
      return STOCK_COLUMNS.map((column) => cells[column])
    }),
  ])
}
