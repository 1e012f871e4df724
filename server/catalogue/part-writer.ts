import type Database from 'better-sqlite3'
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
export function insertPartRows(db: Database.Database, parts: PartInput[]): Map<string, number> {
  const insertPart = db.prepare(
    'INSERT INTO part (partNumber, partKey, kind, name, family, yearFrom, yearTo, notes, attributes, listPriceCents) VALUES (@partNumber, @partKey, @kind, @name, @family, @yearFrom, @yearTo, @notes, @attributes, @listPriceCents)',
  )
  const insertMark = db.prepare('INSERT INTO part_mark (partId, type, value, valueKey) VALUES (@partId, @type, @value, @valueKey)')
  const ids = new Map<string, number>()
  for (const part of parts) {
    const columns = partColumns(part)
    const id = Number(insertPart.run({ ...columns, attributes: JSON.stringify(columns.attributes) }).lastInsertRowid)
    ids.set(part.partNumber, id)
    for (const mark of markRows(id, part)) insertMark.run(mark)
  }
  rewritePartWords(db, ids.values())
  return ids
}
