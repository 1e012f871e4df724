import { chunks, type Database, type SqlValue } from '../db/database'
import type { PartInput } from '../../shared/schemas/part-input'
import { normalisePartCode } from '../../shared/schemas/part'
import { insertPartWords } from './part-word-writer'

/** Rows per multi-row insert, well under every driver's parameter limit. */
const PARTS_PER_INSERT = 200
const MARKS_PER_INSERT = 250

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

/**
 * Inserts new parts with their marks and search words, several rows a
 * statement, inside the caller's transaction; their ids by part number.
 */
export async function insertPartRows(
  db: Database,
  parts: readonly PartInput[],
  batchId: number | null,
  now: Date,
): Promise<Map<string, number>> {
  const ids = new Map<string, number>()
  for (const chunk of chunks(parts, PARTS_PER_INSERT)) {
    const rows = await db.all<{ id: number; partNumber: string }>(
      `INSERT INTO part ("partNumber", "partKey", "kind", "name", "family", "yearFrom", "yearTo", "notes", "attributes", "listPriceCents",
         "batchId", "createdAt", "updatedAt")
       VALUES ${chunk.map(() => '(?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?)').join(', ')} RETURNING "id", "partNumber"`,
      chunk.flatMap((part): SqlValue[] => {
        const c = partColumns(part)
        const attributes = JSON.stringify(c.attributes)
        return [
          c.partNumber,
          c.partKey,
          c.kind,
          c.name,
          c.family,
          c.yearFrom,
          c.yearTo,
          c.notes,
          attributes,
          c.listPriceCents,
          batchId,
          now,
          now,
        ]
      }),
    )
    // The rows come back in no set order: match them by part number (unique).
    for (const row of rows) ids.set(row.partNumber, row.id)
    const placed = chunk.map((part) => ({ id: ids.get(part.partNumber)!, part }))
    await insertMarks(db, placed)
    await insertPartWords(
      db,
      placed.map(({ id, part }) => ({ id, name: part.name, family: part.family })),
    )
  }
  return ids
}

/** Inserts the marks of parts (whose old marks are gone), several rows a statement. */
export async function insertMarks(db: Database, parts: readonly { id: number; part: PartInput }[]): Promise<void> {
  const marks = parts.flatMap(({ id, part }) => markRows(id, part))
  for (const chunk of chunks(marks, MARKS_PER_INSERT)) {
    await db.run(
      `INSERT INTO part_mark ("partId", "type", "value", "valueKey") VALUES ${chunk.map(() => '(?, ?, ?, ?)').join(', ')}`,
      chunk.flatMap((mark) => [mark.partId, mark.type, mark.value, mark.valueKey]),
    )
  }
}
