import type Database from 'better-sqlite3'
import { changeRecorder, insertBatch, SQL_NOW, type PreviousRows } from './import-change-log'

export type Editor = { id: number; name: string }

/**
 * An editor's change by hand is recorded like a one-row import batch: it shows
 * in the batch history, can be reverted, and blocks the revert of an earlier
 * batch whose records it changed (so no revert silently undoes it).
 */
export function handEdit(db: Database.Database, editor: Editor, counts: { created: number; updated: number }) {
  const batchId = insertBatch(db, {
    type: 'links',
    fileName: 'changed by hand',
    fileHash: 'hand edit',
    user: editor,
    counts: { ...counts, unchanged: 0, rejected: 0 },
    validRowsOnly: false,
  })
  const record = changeRecorder(db, batchId)
  const insertModification = db.prepare(
    `INSERT INTO modification (name, title, summary, steps, extraParts, consumables, skillLevel, timeMinutes, cautions, status, source, batchId)
     VALUES (?, ?, '', '[]', '[]', '[]', 'skilled', NULL, '[]', 'proposed', 'editor', ?)`,
  )
  return {
    batchId,
    /** Keeps the link's rows as they were, before it is updated or deleted. */
    rememberLink(linkId: number, action: 'updated' | 'deleted') {
      const link = db.prepare('SELECT * FROM link WHERE id = ?').get(linkId) as Record<string, unknown> & { batchId: number | null }
      const mods = db.prepare('SELECT * FROM link_modification WHERE linkId = ?').all(linkId) as Record<string, unknown>[]
      record('link', linkId, action, link.batchId, { link: [link], link_modification: mods } satisfies PreviousRows)
    },
    rememberIdentity(identityId: number) {
      const identity = db.prepare('SELECT * FROM part_identity WHERE id = ?').get(identityId) as Record<string, unknown> & { batchId: number | null }
      record('identity', identityId, 'deleted', identity.batchId, { part_identity: [identity] })
    },
    /** Modification ids by name; an unknown name becomes a proposed modification of this edit. */
    modificationIds(names: string[]): number[] {
      const find = db.prepare('SELECT id FROM modification WHERE name = ?')
      return names.map((name) => {
        const found = find.get(name) as { id: number } | undefined
        return found ? found.id : Number(insertModification.run(name, name, batchId).lastInsertRowid)
      })
    },
    setLinkModifications(linkId: number, ids: number[]) {
      db.prepare('DELETE FROM link_modification WHERE linkId = ?').run(linkId)
      const insert = db.prepare('INSERT INTO link_modification (linkId, modificationId) VALUES (?, ?)')
      for (const id of ids) insert.run(linkId, id)
    },
    now: SQL_NOW,
  }
}
