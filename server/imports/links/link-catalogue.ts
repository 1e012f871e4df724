import { chunks, pairCondition, placeholders, type Database } from '../../db/database'
import type { LinkSource, Relation, ReviewStatus } from '../../../shared/schemas/fitment'

export type LinkRecord = {
  id: number
  partAId: number
  partBId: number
  relation: Relation
  note: string
  source: LinkSource
  batchId: number | null
  status: ReviewStatus
  createdAt: string | Date
  updatedAt: string | Date
}
export type StoredLink = { record: LinkRecord; mods: LinkModRecord[]; names: string[] }
export type LinkModRecord = { linkId: number; modificationId: number }
export type IdentityRecord = {
  id: number
  partAId: number
  partBId: number
  note: string
  source: LinkSource
  batchId: number | null
  createdAt: string | Date
}

/** Pairs looked up per statement when prefetching (two parameters each). */
const PAIRS_PER_STATEMENT = 250

/**
 * What a links import weighs its rows against, looked up through the pair and
 * part-number indexes (memoised), so the work follows the size of the file,
 * not of the catalogue: a 100-row file never reads a million links. Rows are
 * fetched a chunk of the file at a time (`prefetch`), so PostgreSQL answers a
 * few statements per chunk instead of several per row. Only the modification
 * names, a small table, are read whole.
 */
export async function loadLinkCatalogue(db: Database) {
  const modificationIds = new Map<string, number>()
  const modificationNames = new Map<number, string>()
  for (const { id, name } of await db.all<{ id: number; name: string }>('SELECT "id", "name" FROM modification')) {
    modificationIds.set(name, id)
    modificationNames.set(id, name)
  }
  const partIds = memo((number: string) =>
    db.get<{ id: number }>('SELECT "id" FROM part WHERE "partNumber" = ?', [number]).then((row) => row?.id),
  )
  const links = memo(async (pair: string): Promise<StoredLink | undefined> => {
    const [a, b] = pair.split(':').map(Number) as [number, number]
    const record = await db.get<LinkRecord>('SELECT * FROM link WHERE "partAId" = ? AND "partBId" = ?', [a, b])
    if (!record) return undefined
    const mods = await db.all<LinkModRecord>('SELECT "linkId", "modificationId" FROM link_modification WHERE "linkId" = ?', [record.id])
    const names = mods.map((mod) => modificationNames.get(mod.modificationId) ?? '').sort()
    return { record, mods, names }
  })
  const identities = memo((pair: string) => {
    const [a, b] = pair.split(':').map(Number) as [number, number]
    return db.get<IdentityRecord>('SELECT * FROM part_identity WHERE "partAId" = ? AND "partBId" = ?', [a, b])
  })
  const pairKey = (a: number, b: number) => `${a}:${b}`
  /** Reads the parts and pairs these rows name, in a few statements, into the memos. */
  const prefetch = async (entries: readonly { from: string; to: string }[]) => {
    const numbers = [...new Set(entries.flatMap((entry) => [entry.from, entry.to]))].filter((number) => !partIds.has(number))
    for (const chunk of chunks(numbers)) {
      const rows = await db.all<{ id: number; partNumber: string }>(
        `SELECT "id", "partNumber" FROM part WHERE "partNumber" IN (${placeholders(chunk.length)})`,
        chunk,
      )
      const found = new Map(rows.map((row) => [row.partNumber, row.id]))
      for (const number of chunk) partIds.set(number, found.get(number))
    }
    const pairs = new Map<string, [number, number]>()
    for (const entry of entries) {
      const fromLookup = partIds.get(entry.from)
      const toLookup = partIds.get(entry.to)
      const from = fromLookup instanceof Promise ? await fromLookup : fromLookup
      const to = toLookup instanceof Promise ? await toLookup : toLookup
      if (from === undefined || to === undefined) continue
      const pair: [number, number] = from < to ? [from, to] : [to, from]
      const key = pairKey(...pair)
      if (!links.has(key)) pairs.set(key, pair)
    }
    for (const chunk of chunks([...pairs.values()], PAIRS_PER_STATEMENT)) {
      const params = chunk.flat()
      const records = await db.all<LinkRecord>(`SELECT * FROM link l WHERE ${pairCondition('l', chunk.length)}`, params)
      const identityRecords = await db.all<IdentityRecord>(
        `SELECT * FROM part_identity i WHERE ${pairCondition('i', chunk.length)}`,
        params,
      )
      const mods = new Map<number, LinkModRecord[]>()
      for (const ids of chunks(records.map((record) => record.id))) {
        const rows = await db.all<LinkModRecord>(
          `SELECT "linkId", "modificationId" FROM link_modification WHERE "linkId" IN (${placeholders(ids.length)}) ORDER BY "linkId", "modificationId"`,
          ids,
        )
        for (const row of rows) mods.set(row.linkId, [...(mods.get(row.linkId) ?? []), row])
      }
      const linkByPair = new Map(records.map((record) => [pairKey(record.partAId, record.partBId), record]))
      const identityByPair = new Map(identityRecords.map((record) => [pairKey(record.partAId, record.partBId), record]))
      for (const pair of chunk) {
        const key = pairKey(...pair)
        const record = linkByPair.get(key)
        const linkMods = record ? (mods.get(record.id) ?? []) : []
        links.set(
          key,
          record && { record, mods: linkMods, names: linkMods.map((mod) => modificationNames.get(mod.modificationId) ?? '').sort() },
        )
        identities.set(key, identityByPair.get(key))
      }
    }
  }
  return {
    prefetch,
    partIds,
    modificationIds,
    links,
    identities,
  }
}

/**
 * A lookup asked once per key: a file names the same part on many rows. A
 * value already read comes back as it is, not as a promise, so the planner's
 * hot loop awaits only what it still has to read.
 */
function memo<T>(read: (key: string) => Promise<T>) {
  const known = new Map<string, T>()
  const pending = new Map<string, Promise<T>>()
  return {
    get(key: string): T | Promise<T> {
      if (known.has(key)) return known.get(key) as T
      let value = pending.get(key)
      if (!value) {
        value = read(key).then((found) => {
          known.set(key, found)
          pending.delete(key)
          return found
        })
        pending.set(key, value)
      }
      return value
    },
    has: (key: string) => known.has(key) || pending.has(key),
    set: (key: string, value: T) => void known.set(key, value),
  }
}
