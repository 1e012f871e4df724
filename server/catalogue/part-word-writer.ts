import type { Database } from '../db/database'
import { wordsOf } from './part-words'

/**
 * Writes the search words of parts again from their rows, inside the
 * caller's transaction (the importer's and reverts' bulk writers); call it
 * with every part id a write created or changed.
 */
export async function rewritePartWords(db: Database, partIds: Iterable<number>): Promise<void> {
  for (const id of partIds) {
    await db.run('DELETE FROM part_word WHERE "partId" = ?', [id])
    const row = await db.get<{ name: string; family: string }>('SELECT "name", "family" FROM part WHERE "id" = ?', [id])
    if (row)
      for (const word of wordsOf(row.name, row.family)) await db.run('INSERT INTO part_word ("partId", "word") VALUES (?, ?)', [id, word])
  }
}
