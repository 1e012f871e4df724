import Database from 'better-sqlite3'
import { rawInsert, type LinkRow } from '../raw-insert'

/**
 * A copy of the app's schema (every table and index, as the migrations made
 * them) holding its parts and modifications but no links, for the raw
 * insert baseline of the import rate.
 */
function emptyCatalogueCopy(sourcePath: string, copyPath: string): Database.Database {
  const copy = new Database(copyPath)
  copy.pragma('journal_mode = WAL')
  const source = new Database(sourcePath, { readonly: true })
  const schema = source
    .prepare("SELECT sql FROM sqlite_master WHERE sql IS NOT NULL AND name NOT LIKE 'sqlite_%' ORDER BY type = 'index'")
    .pluck()
    .all() as string[]
  source.close()
  for (const sql of schema) copy.exec(sql)
  copy.prepare('ATTACH DATABASE ? AS source').run(sourcePath)
  copy.exec(
    'INSERT INTO part SELECT * FROM source.part; INSERT INTO modification SELECT * FROM source.modification; DETACH DATABASE source',
  )
  return copy
}

/** Rows per second of raw prepared inserts of each group of rows in turn, into one empty copy of the catalogue. */
export function rawInsertRates(sourcePath: string, copyPath: string, groups: LinkRow[][]): number[] {
  const copy = emptyCatalogueCopy(sourcePath, copyPath)
  try {
    return groups.map((rows) => rows.length / (rawInsert(copy, rows) / 1000))
  } finally {
    copy.close()
  }
}
