import type { MarkType } from '../../shared/schemas/part'
import { chunks, placeholders, type Database } from '../db/database'
import { afterPrefix } from './part-words'

export type KeyRow = { id: number; key: string }
export type MarkKeyRow = { partId: number; type: MarkType; value: string; key: string }

/** Rows read per prefix window: bounds the work however many parts share a prefix. */
const WINDOW_ROWS = 150

const KEY_CHARACTERS = 'ABCDEFGHIJKLMNOPQRSTUVWXYZ0123456789'

/**
 * The prefixes whose ranges hold numbers that start like `key`: the key and
 * the key cut back by one to three characters, for a slip or two near the end
 * and for a number with a suffix more or less.
 */
export function prefixWindows(key: string): string[] {
  const windows: string[] = []
  for (let length = key.length; length >= Math.max(2, key.length - 3); length--) windows.push(key.slice(0, length))
  return windows
}

/**
 * Every key one insertion, deletion or substitution from `key`: looked up
 * exactly, they find a single slip anywhere in the number (the start
 * included, which no prefix of the key can reach).
 */
export function oneSlipKeys(key: string): string[] {
  const keys = new Set<string>()
  for (let at = 0; at <= key.length; at++) {
    const head = key.slice(0, at)
    if (at < key.length) keys.add(head + key.slice(at + 1))
    for (const character of KEY_CHARACTERS) {
      keys.add(head + character + key.slice(at))
      if (at < key.length) keys.add(head + character + key.slice(at + 1))
    }
  }
  keys.delete(key)
  return [...keys]
}

/**
 * Candidates for near matches, read only through the indexes on part.partKey
 * and part_mark.valueKey (exact keys in chunks, and each prefix window a
 * range seek with a row cap), never a scan of the catalogue.
 */
export class NearNumbersRepository {
  constructor(private readonly db: Database) {}

  async partKeys(keys: string[], windows: string[]): Promise<KeyRow[]> {
    const found = new Map<number, KeyRow>()
    for (const list of chunks(keys)) {
      const rows = await this.db.all<KeyRow>(
        `SELECT "id", "partKey" AS "key" FROM part WHERE "partKey" IN (${placeholders(list.length)})`,
        list,
      )
      for (const row of rows) found.set(row.id, row)
    }
    for (const prefix of windows) {
      const rows = await this.db.all<KeyRow>(
        `SELECT "id", "partKey" AS "key" FROM part WHERE "partKey" >= ? AND "partKey" < ? ORDER BY "partKey" LIMIT ?`,
        [prefix, afterPrefix(prefix), WINDOW_ROWS],
      )
      for (const row of rows) found.set(row.id, row)
    }
    return [...found.values()]
  }

  async markKeys(keys: string[], windows: string[]): Promise<MarkKeyRow[]> {
    const found = new Map<string, MarkKeyRow>()
    for (const list of chunks(keys)) {
      const rows = await this.db.all<MarkKeyRow>(
        `SELECT "partId", "type", "value", "valueKey" AS "key" FROM part_mark WHERE "valueKey" IN (${placeholders(list.length)})`,
        list,
      )
      for (const row of rows) found.set(`${row.partId}|${row.type}|${row.value}`, row)
    }
    for (const prefix of windows) {
      const rows = await this.db.all<MarkKeyRow>(
        `SELECT "partId", "type", "value", "valueKey" AS "key" FROM part_mark WHERE "valueKey" >= ? AND "valueKey" < ? ORDER BY "valueKey" LIMIT ?`,
        [prefix, afterPrefix(prefix), WINDOW_ROWS],
      )
      for (const row of rows) found.set(`${row.partId}|${row.type}|${row.value}`, row)
    }
    return [...found.values()]
  }
}
