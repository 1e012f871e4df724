import { chunks, placeholders, type Database } from '../../db/database'
import type { Tick } from '../import-jobs'
import { changeRecorder } from '../../audit/change-log'
import type { PartsPlan } from './part-plan'
import { insertMarks, insertPartRows, partColumns } from '../../catalogue/part-writer'
import { rewritePartWords } from '../../catalogue/part-word-writer'

/** Writes a parts plan; the caller holds the transaction. Answers the ids of the parts written. */
export async function writeParts(db: Database, plan: PartsPlan, batchId: number, now: Date, tick: Tick = () => {}): Promise<number[]> {
  const record = changeRecorder(db, batchId)
  const written: number[] = []
  for (const { id, part, previous } of plan.updates) {
    written.push(id)
    await record('part', id, 'updated', previous.part.batchId, { part: [previous.part], part_mark: previous.marks })
    const c = partColumns(part)
    await db.run(
      `UPDATE part SET "kind" = ?, "name" = ?, "family" = ?, "yearFrom" = ?, "yearTo" = ?, "notes" = ?, "attributes" = ?, "listPriceCents" = ?,
         "batchId" = ?, "updatedAt" = ? WHERE "id" = ?`,
      [c.kind, c.name, c.family, c.yearFrom, c.yearTo, c.notes, JSON.stringify(c.attributes), c.listPriceCents, batchId, now, id],
    )
    tick()
  }
  for (const ids of chunks(written)) await db.run(`DELETE FROM part_mark WHERE "partId" IN (${placeholders(ids.length)})`, ids)
  await insertMarks(db, plan.updates)
  await rewritePartWords(db, written)
  for (const chunk of chunks(plan.creates, 200)) {
    const ids = await insertPartRows(db, chunk, batchId, now)
    for (const part of chunk) {
      written.push(ids.get(part.partNumber)!)
      tick()
    }
  }
  return written
}
