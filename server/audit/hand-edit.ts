import type { Database } from '../db/database'
import { changeRecorder, recordBatch, type PreviousRows } from './change-log'
import { modificationIds, setLinkModifications } from '../fitment/link-rows'

export type Editor = { id: number; name: string }

/**
 * An editor's change by hand is recorded like a one-row import batch: it shows
 * in the batch history, can be reverted, and blocks the revert of an earlier
 * batch whose records it changed (so no revert silently undoes it). Runs in the
 * caller's transaction on the data port, so it works on either database.
 */
export async function handEdit(
  db: Database,
  editor: Editor,
  counts: { created: number; updated: number },
  /** What the batch list shows in place of a file name. */
  label = 'changed by hand',
) {
  const batchId = await recordBatch(db, {
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
    async rememberLink(linkId: number, action: 'updated' | 'deleted') {
      const link = (await db.get<Record<string, unknown> & { batchId: number | null }>('SELECT * FROM link WHERE "id" = ?', [linkId]))!
      const mods = await db.all('SELECT * FROM link_modification WHERE "linkId" = ?', [linkId])
      await record('link', linkId, action, link.batchId, { link: [link], link_modification: mods } satisfies PreviousRows)
    },
    async rememberIdentity(identityId: number) {
      const identity = (await db.get<Record<string, unknown> & { batchId: number | null }>('SELECT * FROM part_identity WHERE "id" = ?', [
        identityId,
      ]))!
      await record('identity', identityId, 'deleted', identity.batchId, { part_identity: [identity] })
    },
    /** Sets a link's modifications; an unknown name becomes a proposed modification of this edit. */
    async setModifications(linkId: number, names: string[]) {
      await setLinkModifications(db, linkId, await modificationIds(db, names, batchId, 'editor'))
    },
  }
}
