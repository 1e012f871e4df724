import type Database from 'better-sqlite3'
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
  createdAt: string
  updatedAt: string
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
  createdAt: string
}

/**
 * What a links import weighs its rows against, looked up row by row through
 * the pair and part-number indexes (memoised), so the work follows the size of
 * the file, not of the catalogue: a 100-row file never reads a million links.
 * Only the modification names, a small table, are read whole.
 */
export function loadLinkCatalogue(db: Database.Database) {
  const partById = db.prepare('SELECT id FROM part WHERE partNumber = ?').pluck()
  const partByKey = db.prepare('SELECT partNumber FROM part WHERE partKey = ? ORDER BY partNumber LIMIT 1').pluck()
  const linkByPair = db.prepare('SELECT * FROM link WHERE partAId = ? AND partBId = ?')
  const modsOfLink = db.prepare('SELECT linkId, modificationId FROM link_modification WHERE linkId = ?')
  const identityByPair = db.prepare('SELECT * FROM part_identity WHERE partAId = ? AND partBId = ?')

  const modificationIds = new Map<string, number>()
  const modificationNames = new Map<number, string>()
  for (const [id, name] of db.prepare('SELECT id, name FROM modification').raw().all() as [number, string][]) {
    modificationIds.set(name, id)
    modificationNames.set(id, name)
  }
  const partIds = memo((number: string) => partById.get(number) as number | undefined)
  const links = memo((pair: string): StoredLink | undefined => {
    const [a, b] = pair.split(':').map(Number)
    const record = linkByPair.get(a, b) as LinkRecord | undefined
    if (!record) return undefined
    const mods = modsOfLink.all(record.id) as LinkModRecord[]
    const names = mods.map((mod) => modificationNames.get(mod.modificationId) ?? '').sort()
    return { record, mods, names }
  })
  const identities = memo((pair: string) => {
    const [a, b] = pair.split(':').map(Number)
    return identityByPair.get(a, b) as IdentityRecord | undefined
  })
  return {
    partIds,
    numberForKey: (key: string) => partByKey.get(key) as string | undefined,
    modificationIds,
    links,
    identities,
  }
}

/** A lookup asked once per key: a file names the same part on many rows. */
function memo<T>(read: (key: string) => T): { get(key: string): T } {
  const known = new Map<string, T>()
  return {
    get(key) {
      if (known.has(key)) return known.get(key) as T
      const value = read(key)
      known.set(key, value)
      return value
    },
  }
}
