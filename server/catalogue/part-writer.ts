import type { Database } from '../db/database'
import type { PartInput } from '../../shared/schemas/part-input'
import { normalisePartCode } from '../../shared/schemas/part'
import { rewritePartWords } from './part-word-writer'

export function partColumns(part: PartInput) {
  return {
    partNumber: part.partNumber,
    partKey: normalisePartCode(part.partNumber),
    kind: part.kind,
    name: part.name,
    family: part.family,
    yearFrom: part.yearFrom,
    yearTo: part.yearTo,
    notes: part.notes,
    attributes: part.attributes,
    listPriceCents: part.listPriceCents,
  }
}

export function markRows(partId: number, part: PartInput) {
  return part.marks.map((mark) => ({ partId, type: mark.type, value: mark.value, valueKey: normalisePartCode(mark.value) }))
}

/** Inserts new parts with their marks, inside the caller's transaction; their ids by part number. */
export async function insertPartRows(db: Database, parts: PartInput[], batchId: number | null = null): Promise<Map<string, number>> {
  const ids = new Map<string, number>()
  for (const part of parts) {
    const c = partColumns(part)
    const id = await db.insert(
      `INSERT INTO part ("partNumber", "partKey", "kind", "name", "family", "yearFrom", "yearTo", "notes", "attributes", "listPriceCents", "batchId")
       VALUES (?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?) RETURNING "id"`,
      [
        c.partNumber,
        c.partKey,
        c.kind,
        c.name,
        c.family,
        c.yearFrom,
        c.yearTo,
        c.notes,
        JSON.stringify(c.attributes),
        c.listPriceCents,
        batchId,
      ],
    )
    ids.set(part.partNumber, id)
    await insertMarks(db, id, part)
  }
  await rewritePartWords(db, ids.values())
  return ids
}

export async function insertMarks(db: Database, partId: number, part: PartInput): Promise<void> {
  for (const mark of markRows(partId, part)) {
    await db.run('INSERT INTO part_mark ("partId", "type", "value", "valueKey") VALUES (?, ?, ?, ?)', [
      partId,
      mark.type,
      mark.value,
      mark.valueKey,
    ])
  }
}
