import type Database from 'better-sqlite3'
import type { Tick } from '../import-jobs'
import type { PartInput } from '../../../shared/schemas/part-input'
import { SQL_NOW, changeRecorder } from '../../audit/change-log'
import type { PartsPlan } from './part-plan'
import { markRows, partColumns } from '../../catalogue/part-writer'
import { rewritePartWords } from '../../catalogue/part-word-writer'

/** Writes a parts plan with prepared statements; the caller holds the transaction. Answers the ids of the parts written. */
export function writeParts(db: Database.Database, plan: PartsPlan, batchId: number, tick: Tick = () => {}): number[] {
  const insertPart = db.prepare(
    'INSERT INTO part (partNumber, partKey, kind, name, family, yearFrom, yearTo, notes, attributes, listPriceCents, batchId) VALUES (?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?)',
  )
  const updatePart = db.prepare(
    `UPDATE part SET kind = ?, name = ?, family = ?, yearFrom = ?, yearTo = ?, notes = ?, attributes = ?, listPriceCents = ?, batchId = ?, updatedAt = ${SQL_NOW} WHERE id = ?`,
  )
  const insertMark = db.prepare('INSERT INTO part_mark (partId, type, value, valueKey) VALUES (?, ?, ?, ?)')
  const deleteMarks = db.prepare('DELETE FROM part_mark WHERE partId = ?')
  const record = changeRecorder(db, batchId)
  const writeMarks = (partId: number, part: PartInput) => {
    for (const mark of markRows(partId, part)) insertMark.run(partId, mark.type, mark.value, mark.valueKey)
  }

  const written: number[] = []
  for (const { id, part, previous } of plan.updates) {
    written.push(id)
    record('part', id, 'updated', previous.part.batchId, { part: [previous.part], part_mark: previous.marks })
    const c = partColumns(part)
    updatePart.run(c.kind, c.name, c.family, c.yearFrom, c.yearTo, c.notes, JSON.stringify(c.attributes), c.listPriceCents, batchId, id)
    deleteMarks.run(id)
    writeMarks(id, part)
    tick()
  }
  for (const part of plan.creates) {
    const c = partColumns(part)
    const result = insertPart.run(
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
    )
    const id = Number(result.lastInsertRowid)
    written.push(id)
    writeMarks(id, part)
    tick()
  }
  rewritePartWords(db, written)
  return written
}
