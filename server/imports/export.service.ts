import type { Database } from '../db/database'
import type { ExportFile } from '../../shared/schemas/imports'
import type { PartInput } from '../../shared/schemas/part-input'
import { MARK_TYPES, type MarkType } from '../../shared/schemas/part'
import { PART_KINDS, type PartKind } from '../../shared/schemas/part-kinds'
import { knownAttributes } from '../../shared/schemas/part-attributes'
import { toCsv } from '../../shared/csv-cells'
import { LIST_PRICE_COLUMN, MARK_COLUMNS, PART_COLUMNS, camelToSnake, partCells } from './csv/part-row'
import { LINK_COLUMNS } from './links/link-rows'
import { pushTo } from '../lib/map-list'
import { stockCsv } from './stock/stock-export'
import { vehiclesCsv } from './vehicles/vehicle-export'

type PartRow = Omit<PartInput, 'attributes' | 'marks'> & { id: number; attributes: string }

/** Known attribute columns in the order the kinds list them, so related columns sit together. */
const KNOWN_COLUMN_ORDER = [...new Set(PART_KINDS.flatMap((kind) => knownAttributes(kind).map((a) => camelToSnake(a.name))))]

/**
 * The catalogue, vehicles and stock as CSV files in the import format, so that importing an export
 * changes nothing. Links are the approved ones plus identities: proposed and
 * rejected links are review items, and an import would approve them.
 */
export function exportCsv(db: Database, file: ExportFile): Promise<string> {
  switch (file) {
    case 'parts.csv':
      return partsCsv(db)
    case 'links.csv':
      return linksCsv(db)
    case 'vehicles.csv':
      return vehiclesCsv(db)
    case 'stock.csv':
      return stockCsv(db)
  }
}

/** Reads the whole catalogue, so it runs where imports run (the import worker), off the request path. */
export class ExportService {
  constructor(private readonly runner: { export(file: ExportFile): Promise<string> }) {}

  csv(file: ExportFile): Promise<string> {
    return this.runner.export(file)
  }
}

export async function partsCsv(db: Database): Promise<string> {
  const rows = await db.all<PartRow>(
    'SELECT "id", "partNumber", "kind", "name", "family", "yearFrom", "yearTo", "notes", "attributes", "listPriceCents" FROM part ORDER BY "partNumber"',
  )
  const marks = new Map<number, { type: MarkType; value: string }[]>()
  const markRows = await db.all<{ partId: number; type: MarkType; value: string }>(
    'SELECT "partId", "type", "value" FROM part_mark ORDER BY "value"',
  )
  for (const { partId, type, value } of markRows) pushTo(marks, partId, { type, value })
  const cells = rows.map((row) => {
    const partMarks = (marks.get(row.id) ?? []).sort((a, b) => MARK_TYPES.indexOf(a.type) - MARK_TYPES.indexOf(b.type))
    const part: PartInput = {
      ...row,
      kind: row.kind as PartKind,
      attributes: JSON.parse(row.attributes) as PartInput['attributes'],
      marks: partMarks,
    }
    return partCells(part)
  })
  const fixed: string[] = [...PART_COLUMNS, ...Object.keys(MARK_COLUMNS)]
  // The list price is optional in the format: written only when some part has one, as importing then leaves it as it is.
  const priced = cells.some((row) => row[LIST_PRICE_COLUMN] !== '') ? [LIST_PRICE_COLUMN] : []
  const used = new Set(
    cells.flatMap((row) =>
      Object.keys(row).filter((column) => !fixed.includes(column) && column !== LIST_PRICE_COLUMN && row[column] !== ''),
    ),
  )
  const known = KNOWN_COLUMN_ORDER.filter((column) => used.has(column))
  const unknown = [...used].filter((column) => !known.includes(column)).sort()
  const header = [...fixed, ...priced, ...known, ...unknown]
  return toCsv([header, ...cells.map((row) => header.map((column) => row[column] ?? ''))])
}

export async function linksCsv(db: Database): Promise<string> {
  const links = await db.all<{ id: number; fromPart: string; toPart: string; relation: string; note: string; source: string }>(
    `SELECT l."id", a."partNumber" AS "fromPart", b."partNumber" AS "toPart", l."relation", l."note", l."source" FROM link l
       JOIN part a ON a."id" = l."partAId" JOIN part b ON b."id" = l."partBId" WHERE l."status" = 'approved' ORDER BY l."id"`,
  )
  const mods = new Map<number, string[]>()
  const modRows = await db.all<{ linkId: number; name: string }>(
    'SELECT lm."linkId", m."name" FROM link_modification lm JOIN modification m ON m."id" = lm."modificationId" ORDER BY m."name"',
  )
  for (const { linkId, name } of modRows) pushTo(mods, linkId, name)
  const identities = await db.all<{ fromPart: string; toPart: string; note: string; source: string }>(
    `SELECT a."partNumber" AS "fromPart", b."partNumber" AS "toPart", i."note", i."source" FROM part_identity i
       JOIN part a ON a."id" = i."partAId" JOIN part b ON b."id" = i."partBId" ORDER BY i."id"`,
  )
  return toCsv([
    [...LINK_COLUMNS],
    ...links.map((l) => [l.fromPart, l.toPart, l.relation, (mods.get(l.id) ?? []).join('; '), l.note, l.source]),
    ...identities.map((i) => [i.fromPart, i.toPart, 'identical', '', i.note, i.source]),
  ])
}
