import type { EntityManager } from 'typeorm'
import type { LinkSource, Relation, ReviewStatus } from '../../shared/schemas/fitment'
import { IdentityEntity } from '../entities/identity.entity'
import { LinkEntity } from '../entities/link.entity'
import { ModificationEntity } from '../entities/modification.entity'
import { unknownModification } from './modification.service'

export type LinkInput = {
  partIds: [number, number]
  relation: Relation
  modifications: string[]
  note: string
  source: LinkSource
  status: ReviewStatus
  batchId?: number | null
}

/** Fit is mutual: a pair is stored once, lower id first. */
export function orderedPair([a, b]: [number, number]): [number, number] {
  return a < b ? [a, b] : [b, a]
}

/**
 * The modifications by name, creating a proposed entry for a name the catalogue
 * does not know yet, for an editor to complete.
 */
export async function modificationIds(manager: EntityManager, names: string[]): Promise<number[]> {
  const repo = manager.getRepository(ModificationEntity)
  const ids: number[] = []
  for (const name of names) {
    const existing = await repo.findOneBy({ name })
    if (existing) {
      ids.push(existing.id)
      continue
    }
    const created = await repo.save(repo.create({ ...unknownModification(name), source: 'import' }))
    ids.push(created.id)
  }
  return ids
}

/** Inserts a link with its modifications inside the caller's transaction. */
export async function insertLink(manager: EntityManager, input: LinkInput): Promise<number> {
  const [partAId, partBId] = orderedPair(input.partIds)
  const result = await manager.insert(LinkEntity, {
    partAId,
    partBId,
    relation: input.relation,
    note: input.note,
    source: input.source,
    status: input.status,
    batchId: input.batchId ?? null,
  })
  const linkId = result.identifiers[0]?.id as number
  const mods = await modificationIds(manager, input.modifications)
  if (mods.length) {
    await manager
      .createQueryBuilder()
      .insert()
      .into('link_modification')
      .values(mods.map((modificationId) => ({ linkId, modificationId })))
      .execute()
  }
  return linkId
}

export async function insertIdentity(
  manager: EntityManager,
  input: { partIds: [number, number]; note: string; source: LinkSource; batchId?: number | null },
): Promise<number> {
  const [partAId, partBId] = orderedPair(input.partIds)
  const result = await manager.insert(IdentityEntity, {
    partAId,
    partBId,
    note: input.note,
    source: input.source,
    batchId: input.batchId ?? null,
  })
  return result.identifiers[0]?.id as number
}
