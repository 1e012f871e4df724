import type Database from 'better-sqlite3'
import type { ReportedPair } from '../../shared/schemas/field-reports'
import { handEdit, type Editor } from '../audit/hand-edit'
import { AppError } from '../errors/app-error'
import { insertLinkRow, modificationIds, orderedPair, setLinkModifications } from '../fitment/link-rows'

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
export function approvePairs(db: Database.Database, reportId: number, pairs: ReportedPair[], editor: Editor): ApprovalOutcome {
  const partId = db.prepare('SELECT id FROM part WHERE "partNumber" = ?')
  const findLink = db.prepare('SELECT id, relation, status FROM link WHERE "partAId" = ? AND "partBId" = ?')
  const insertEvidence = db.prepare(
    'INSERT OR IGNORE INTO field_report_link ("reportId", "linkId", "agrees", "batchId") VALUES (?, ?, ?, ?)',
  )
  const resolved = pairs.map((pair, index) => {
    const ids = [pair.from, pair.to].map((number) => (partId.get(number) as { id: number } | undefined)?.id)
    if (ids[0] === undefined || ids[1] === undefined) {
      throw AppError.conflict(`Pair ${index + 1} names a part removed since the report was filed; ask the reporter again or reject it.`)
    }
    const partIds = orderedPair([ids[0], ids[1]])
    return { pair, partIds, stored: findLink.get(...partIds) as StoredLink | undefined }
  })
  const creates = resolved.filter((entry) => !entry.stored).length
  const edit = handEdit(db, editor, { created: creates, updated: resolved.length - creates }, `field report #${reportId}`)
  const outcome: ApprovalOutcome = { batchId: edit.batchId, created: [], confirmed: [], contradicted: [] }
  for (const { pair, partIds, stored } of resolved) {
    if (!stored) {
      const id = insertLinkRow(db, {
        partIds,
        relation: pair.relation,
        modifications: pair.modifications,
        note: pair.note || `Found on the car: field report #${reportId}.`,
        source: 'field-report',
        status: 'approved',
        batchId: edit.batchId,
      })
      insertEvidence.run(reportId, id, 1, edit.batchId)
      outcome.created.push(id)
    } else if (stored.relation === pair.relation) {
      if (stored.status !== 'approved') {
        edit.rememberLink(stored.id, 'updated')
        db.prepare(`UPDATE link SET status = 'approved', batchId = ?, updatedAt = ${edit.now} WHERE id = ?`).run(edit.batchId, stored.id)
        if (pair.modifications.length) setLinkModifications(db, stored.id, modificationIds(db, pair.modifications, edit.batchId, 'editor'))
      }
      insertEvidence.run(reportId, stored.id, 1, edit.batchId)
      outcome.confirmed.push(stored.id)
    } else {
      insertEvidence.run(reportId, stored.id, 0, edit.batchId)
      outcome.contradicted.push(stored.id)
    }
  }
  return outcome
}
