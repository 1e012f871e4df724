import type { Database } from '../../db/database'
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
    await db.run('DELETE FROM part_mark WHERE "partId" = ?', [id])
    await insertMarks(db, id, part)
    tick()
  }
  await rewritePartWords(db, written)
  for (const part of plan.creates) {
    const [id] = (await insertPartRows(db, [part], batchId)).values()
    written.push(id!)
    tick()
  }
  return written
}
