import type { Database } from '../db/database'
import type { ReportedPair } from '../../shared/schemas/field-reports'
import { handEdit, type Editor } from '../audit/hand-edit'
import { AppError } from '../errors/app-error'
import { insertLinkRow, orderedPair } from '../fitment/link-rows'

export type ApprovalOutcome = {
  batchId: number
  /** Links written or confirmed, and links the report contradicts (left as they are, for an editor to look at). */
  created: number[]
  confirmed: number[]
  contradicted: number[]
}

type StoredLink = { id: number; relation: string; status: string }

/**
 * Turns an approved report's pairs into reviewed links, in the caller's
 * transaction, as one recorded batch: a new pair becomes an approved link from
 * the field; a link that says the same is confirmed (and approved if it was only
 * proposed); a link that says otherwise is never changed silently — the report
 * is counted against it and it shows as contradicted.
 */
export async function approvePairs(db: Database, reportId: number, pairs: ReportedPair[], editor: Editor): Promise<ApprovalOutcome> {
  const insertEvidence = (linkId: number, agrees: boolean, batchId: number) =>
    db.run('INSERT INTO field_report_link ("reportId", "linkId", "agrees", "batchId") VALUES (?, ?, ?, ?) ON CONFLICT DO NOTHING', [
      reportId,
      linkId,
      agrees ? 1 : 0,
      batchId,
    ])
  const resolved = []
  for (const [index, pair] of pairs.entries()) {
    const ids: (number | undefined)[] = []
    for (const number of [pair.from, pair.to])
      ids.push((await db.get<{ id: number }>('SELECT "id" FROM part WHERE "partNumber" = ?', [number]))?.id)
    if (ids[0] === undefined || ids[1] === undefined) {
      throw AppError.conflict(`Pair ${index + 1} names a part removed since the report was filed; ask the reporter again or reject it.`)
    }
    const partIds = orderedPair([Number(ids[0]), Number(ids[1])])
    const stored = await db.get<StoredLink>('SELECT "id", "relation", "status" FROM link WHERE "partAId" = ? AND "partBId" = ?', partIds)
    resolved.push({ pair, partIds, stored })
  }
  const creates = resolved.filter((entry) => !entry.stored).length
  const edit = await handEdit(db, editor, { created: creates, updated: resolved.length - creates }, `field report #${reportId}`)
  const outcome: ApprovalOutcome = { batchId: edit.batchId, created: [], confirmed: [], contradicted: [] }
  for (const { pair, partIds, stored } of resolved) {
    if (!stored) {
      const id = await insertLinkRow(db, {
        partIds,
        relation: pair.relation,
        modifications: pair.modifications,
        note: pair.note || `Found on the car: field report #${reportId}.`,
        source: 'field-report',
        status: 'approved',
        batchId: edit.batchId,
      })
      await insertEvidence(id, true, edit.batchId)
      outcome.created.push(id)
    } else if (stored.relation === pair.relation) {
      if (stored.status !== 'approved') {
        await edit.rememberLink(stored.id, 'updated')
        await db.run(`UPDATE link SET "status" = 'approved', "batchId" = ?, "updatedAt" = ? WHERE "id" = ?`, [
          edit.batchId,
          new Date(),
          stored.id,
        ])
        if (pair.modifications.length) await edit.setModifications(stored.id, pair.modifications)
      }
      await insertEvidence(stored.id, true, edit.batchId)
      outcome.confirmed.push(stored.id)
    } else {
      await insertEvidence(stored.id, false, edit.batchId)
      outcome.contradicted.push(stored.id)
    }
  }
  return outcome
}
