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
 * What a links import weighs its rows against, read in a few whole-table
 * queries: looking parts and pairs up in memory is what keeps a 100,000-row
 * import fast.
 */
export function loadLinkCatalogue(db: Database.Database) {
  const partIds = new Map<string, number>()
  const keys = new Map<string, string>()
  for (const [id, partNumber, partKey] of db.prepare('SELECT id, partNumber, partKey FROM part').raw().all() as [
    number,
    string,
    string,
  ][]) {
    partIds.set(partNumber, id)
    keys.set(partKey, partNumber)
  }
  const modificationIds = new Map<string, number>()
  const modificationNames = new Map<number, string>()
  for (const [id, name] of db.prepare('SELECT id, name FROM modification').raw().all() as [number, string][]) {
    modificationIds.set(name, id)
    modificationNames.set(id, name)
  }
  const modsByLink = new Map<number, LinkModRecord[]>()
  for (const mod of db.prepare('SELECT linkId, modificationId FROM link_modification').all() as LinkModRecord[]) {
    const list = modsByLink.get(mod.linkId)
    if (list) list.push(mod)
    else modsByLink.set(mod.linkId, [mod])
  }
  const links = new Map<string, StoredLink>()
  for (const record of db.prepare('SELECT * FROM link').all() as LinkRecord[]) {
    const mods = modsByLink.get(record.id) ?? []
    const names = mods.map((mod) => modificationNames.get(mod.modificationId) ?? '').sort()
    links.set(`${record.partAId}:${record.partBId}`, { record, mods, names })
  }
  const identities = new Map<string, IdentityRecord>()
  for (const record of db.prepare('SELECT * FROM part_identity').all() as IdentityRecord[]) {
    identities.set(`${record.partAId}:${record.partBId}`, record)
  }
  return { partIds, numberForKey: (key: string) => keys.get(key), modificationIds, links, identities }
}
