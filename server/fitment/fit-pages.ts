import { BUILD_SLOTS } from '../../shared/build-template'
import { RELATIONS, type FitSource, type Relation } from '../../shared/schemas/fitment'
import type { PartKind } from '../../shared/schemas/part-kinds'
import { byCodePoint } from './link.repository'

const KIND_ORDER = new Map<string, number>(BUILD_SLOTS.map((slot, index) => [slot.id, index]))

export type GroupKey = { kind: PartKind; relation: Relation; source: FitSource }

/** Kind in build order, then relation (what works first), then reviewed before inferred. */
export function compareGroups(a: GroupKey, b: GroupKey): number {
  return (
    (KIND_ORDER.get(a.kind) ?? 99) - (KIND_ORDER.get(b.kind) ?? 99) ||
    RELATIONS.indexOf(a.relation) - RELATIONS.indexOf(b.relation) ||
    Number(a.source === 'inferred') - Number(b.source === 'inferred')
  )
}

/**
 * One page of part ids in part-number order (plain code-point comparison: a
 * hub group holds thousands, and locale rules do not matter for part numbers).
 */
export function pageByNumber(ids: number[], numberOf: (id: number) => string, offset: number, limit: number): number[] {
  if (offset >= ids.length) return []
  const keyed = ids.map((id) => ({ id, number: numberOf(id) }))
  keyed.sort((a, b) => byCodePoint(a.number, b.number))
  return keyed.slice(offset, offset + limit).map((entry) => entry.id)
}
