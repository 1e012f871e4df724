import type Database from 'better-sqlite3'

/** One row of a links file: from, to, relation, modifications (semicolon list), note, source. */
export type LinkRow = [string, string, string, string, string, string]

/**
 * The floor an import is compared with: the same rows straight into the link
 * tables with prepared statements in one transaction (identical rows into
 * part_identity). Returns the milliseconds the insert took.
 */
export function rawInsert(db: Database.Database, rows: LinkRow[]): number {
  const ids = new Map(db.prepare('SELECT partNumber, id FROM part').raw().all() as [string, number][])
  const modificationIds = new Map(db.prepare('SELECT name, id FROM modification').raw().all() as [string, number][])
  const insertLink = db.prepare("INSERT INTO link (partAId, partBId, relation, note, source, status) VALUES (?, ?, ?, ?, ?, 'approved')")
  const insertMod = db.prepare('INSERT INTO link_modification (linkId, modificationId) VALUES (?, ?)')
  const insertIdentity = db.prepare('INSERT INTO part_identity (partAId, partBId, note, source) VALUES (?, ?, ?, ?)')
  const started = performance.now()
  db.transaction(() => {
    for (const [from, to, relation, mods, note, source] of rows) {
      const a = ids.get(from)!
      const b = ids.get(to)!
      if (relation === 'identical') {
        insertIdentity.run(Math.min(a, b), Math.max(a, b), note, source)
        continue
      }
      const id = insertLink.run(Math.min(a, b), Math.max(a, b), relation, note, source).lastInsertRowid
      for (const name of mods ? mods.split(';') : []) insertMod.run(id, modificationIds.get(name)!)
    }
  })()
  return performance.now() - started
}
