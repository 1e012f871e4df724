import type Database from 'better-sqlite3'
import { changeRecorder, insertBatch, SQL_NOW, type PreviousRows } from './change-log'
import { modificationIds, setLinkModifications } from '../fitment/link-rows'

export type Editor = { id: number; name: string }

/**
 * An editor's change by hand is recorded like a one-row import batch: it shows
 * in the batch history, can be reverted, and blocks the revert of an earlier
 * batch whose records it changed (so no revert silently undoes it).
 */
export function handEdit(
  db: Database.Database,
  editor: Editor,
  counts: { created: number; updated: number },
  /** What the batch list shows in place of a file name. */
  label = 'changed by hand',
) {
  const batchId = insertBatch(db, {
    type: 'links',
    fileName: label,
    fileHash: 'hand edit',
    user: editor,
    counts: { ...counts, unchanged: 0, rejected: 0 },
    validRowsOnly: false,
  })
  const record = changeRecorder(db, batchId)
  return {
    batchId,
    /** Keeps the link's rows as they were, before it is updated or deleted. */
    rememberLink(linkId: number, action: 'updated' | 'deleted') {
      const link = db.prepare('SELECT * FROM link WHERE id = ?').get(linkId) as Record<string, unknown> & { batchId: number | null }
      const mods = db.prepare('SELECT * FROM link_modification WHERE linkId = ?').all(linkId) as Record<string, unknown>[]
      record('link', linkId, action, link.batchId, { link: [link], link_modification: mods } satisfies PreviousRows)
    },
    rememberIdentity(identityId: number) {
      const identity = db.prepare('SELECT * FROM part_identity WHERE id = ?').get(identityId) as Record<string, unknown> & {
        batchId: number | null
      }
      record('identity', identityId, 'deleted', identity.batchId, { part_identity: [identity] })
    },
    /** Sets a link's modifications; an unknown name becomes a proposed modification of this edit. */
    setModifications(linkId: number, names: string[]) {
      setLinkModifications(db, linkId, modificationIds(db, names, batchId, 'editor'))
    },
    now: SQL_NOW,
  }
}
