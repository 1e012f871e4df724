import type { Part } from '../../shared/schemas/part'
import { MARK_TYPES, type MarkType } from '../../shared/schemas/part'
import type { PartKind } from '../../shared/schemas/part-kinds'
import type { PartAttributes } from '../../shared/schemas/part-attributes'
import { chunks, placeholders, type Database } from '../db/database'

/** A catalogue part with its row id, as services work with it. */
export type PartRecord = Part & { id: number }

type PartRow = {
  id: number
  partNumber: string
  kind: PartKind
  name: string
  family: string
  yearFrom: number | null
  yearTo: number | null
  notes: string
  attributes: string
  listPriceCents: number | null
}
type MarkRow = { partId: number; type: MarkType; value: string }

const PART_COLUMNS =
  'p."id", p."partNumber", p."kind", p."name", p."family", p."yearFrom", p."yearTo", p."notes", p."attributes", p."listPriceCents"'

function sortMarks(marks: { type: MarkType; value: string }[]) {
  return marks.sort((a, b) => MARK_TYPES.indexOf(a.type) - MARK_TYPES.indexOf(b.type) || a.value.localeCompare(b.value))
}

/** The part and part_mark tables: every read of a whole part goes through here. */
/** A part as a graph node is labelled. */
export type PartLabel = { name: string; family: string }

export class PartRepository {
  constructor(private readonly db: Database) {}

  private async withMarks(rows: PartRow[]): Promise<PartRecord[]> {
    if (rows.length === 0) return []
    const marks = new Map<number, { type: MarkType; value: string }[]>()
    for (const ids of chunks(rows.map((row) => row.id))) {
      const found = await this.db.all<MarkRow>(
        `SELECT "partId", "type", "value" FROM part_mark WHERE "partId" IN (${placeholders(ids.length)})`,
        ids,
      )
      for (const mark of found) {
        const list = marks.get(mark.partId)
        if (list) list.push({ type: mark.type, value: mark.value })
        else marks.set(mark.partId, [{ type: mark.type, value: mark.value }])
      }
    }
    return rows.map((row) => ({
      ...row,
      attributes: JSON.parse(row.attributes) as PartAttributes,
      marks: sortMarks(marks.get(row.id) ?? []),
    }))
  }

  /** Parts by id, with their marks, in the order of the ids given (unknown ids are left out). */
  async byIds(ids: readonly number[]): Promise<PartRecord[]> {
    const rows: PartRow[] = []
    for (const list of chunks([...new Set(ids)])) {
      rows.push(...(await this.db.all<PartRow>(`SELECT ${PART_COLUMNS} FROM part p WHERE p."id" IN (${placeholders(list.length)})`, list)))
    }
    const byId = new Map((await this.withMarks(rows)).map((part) => [part.id, part]))
    return ids.flatMap((id) => {
      const part = byId.get(id)
      return part ? [part] : []
    })
  }

  /** Name and family by part id: what a graph view labels its nodes with, without attributes or marks. */
  async labelsByIds(ids: readonly number[]): Promise<Map<number, PartLabel>> {
    const labels = new Map<number, PartLabel>()
    for (const list of chunks([...new Set(ids)])) {
      const rows = await this.db.all<PartLabel & { id: number }>(
        `SELECT "id", "name", "family" FROM part WHERE "id" IN (${placeholders(list.length)})`,
        list,
      )
      for (const { id, name, family } of rows) labels.set(id, { name, family })
    }
    return labels
  }

  async byNumber(partNumber: string): Promise<PartRecord | undefined> {
    const row = await this.db.get<PartRow>(`SELECT ${PART_COLUMNS} FROM part p WHERE p."partNumber" = ?`, [partNumber])
    return row ? (await this.withMarks([row]))[0] : undefined
  }

  /** The first catalogued part whose normalised number is the key. */
  async byKey(key: string): Promise<PartRecord | undefined> {
    const row = await this.db.get<PartRow>(`SELECT ${PART_COLUMNS} FROM part p WHERE p."partKey" = ? ORDER BY p."id" LIMIT 1`, [key])
    return row ? (await this.withMarks([row]))[0] : undefined
  }

  /** The first catalogued part carrying a mark with this normalised value. */
  async byMarkKey(key: string): Promise<PartRecord | undefined> {
    const row = await this.db.get<PartRow>(
      `SELECT ${PART_COLUMNS} FROM part p WHERE p."id" = (SELECT MIN(m."partId") FROM part_mark m WHERE m."valueKey" = ?)`,
      [key],
    )
    return row ? (await this.withMarks([row]))[0] : undefined
  }

  /** List prices by part number, for the parts that have one (what a quote charges for a part to order). */
  async listPrices(partNumbers: readonly string[]): Promise<Map<string, number>> {
    const prices = new Map<string, number>()
    for (const list of chunks([...new Set(partNumbers)])) {
      const rows = await this.db.all<{ partNumber: string; listPriceCents: number }>(
        `SELECT "partNumber", "listPriceCents" FROM part WHERE "listPriceCents" IS NOT NULL AND "partNumber" IN (${placeholders(list.length)})`,
        list,
      )
      for (const row of rows) prices.set(row.partNumber, Number(row.listPriceCents))
    }
    return prices
  }

  async count(): Promise<number> {
    const row = await this.db.get<{ total: number }>('SELECT CAST(COUNT(*) AS INTEGER) AS "total" FROM part')
    return row?.total ?? 0
  }
}

/** The part as the API shows it (without the row id). */
export function toPart({ id: _id, ...part }: PartRecord): Part {
  return part
}
