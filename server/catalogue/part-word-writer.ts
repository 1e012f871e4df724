import { chunks, placeholders, type Database } from '../db/database'
import { wordsOf } from './part-words'

const WORDS_PER_INSERT = 400

/** Inserts the search words of parts that have none yet, several rows a statement. */
export async function insertPartWords(db: Database, parts: readonly { id: number; name: string; family: string }[]): Promise<void> {
  const words = parts.flatMap(({ id, name, family }) => wordsOf(name, family).map((word) => [id, word] as const))
  for (const chunk of chunks(words, WORDS_PER_INSERT)) {
    await db.run(`INSERT INTO part_word ("partId", "word") VALUES ${chunk.map(() => '(?, ?)').join(', ')}`, chunk.flat())
  }
}

/**
 * Writes the search words of parts again from their rows, inside the
 * caller's transaction (the importer's and reverts' bulk writers); call it
 * with every part id a write created or changed.
 */
export async function rewritePartWords(db: Database, partIds: Iterable<number>): Promise<void> {
  for (const ids of chunks([...partIds])) {
    await db.run(`DELETE FROM part_word WHERE "partId" IN (${placeholders(ids.length)})`, ids)
    const rows = await db.all<{ id: number; name: string; family: string }>(
      `SELECT "id", "name", "family" FROM part WHERE "id" IN (${placeholders(ids.length)})`,
      ids,
    )
    await insertPartWords(db, rows)
  }
}
