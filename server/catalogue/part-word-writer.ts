import type BetterSqlite3 from 'better-sqlite3'
import { wordsOf } from './part-words'

/**
 * Writes the search words of parts again from their rows, inside the
 * caller's transaction on the raw connection (the importer's and the demo's
 * bulk writers); call it with every part id a write created or changed.
 */
export function rewritePartWords(db: BetterSqlite3.Database, partIds: Iterable<number>) {
  const read = db.prepare('SELECT "name", "family" FROM part WHERE "id" = ?')
  const clear = db.prepare('DELETE FROM part_word WHERE "partId" = ?')
  const insert = db.prepare('INSERT INTO part_word ("partId", "word") VALUES (?, ?)')
  for (const id of partIds) {
    clear.run(id)
    const row = read.get(id) as { name: string; family: string } | undefined
    if (row) for (const word of wordsOf(row.name, row.family)) insert.run(id, word)
  }
}
