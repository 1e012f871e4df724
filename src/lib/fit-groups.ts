import type { FitResult, Relation } from '@shared/schemas/fitment'
import { PART_KINDS, type PartKind } from '@shared/schemas/part-kinds'
import { RELATIONS } from '@shared/schemas/fitment'

export type FitFilters = { relation?: Relation; kind?: PartKind; inferred: boolean }

export type FitGroup = {
  kind: PartKind
  total: number
  relations: { relation: Relation; results: FitResult[] }[]
}

export function filterFits(results: readonly FitResult[], filters: FitFilters): FitResult[] {
  return results.filter(
    (result) =>
      (!filters.relation || result.relation === filters.relation) &&
      (!filters.kind || result.part.kind === filters.kind) &&
      (filters.inferred || result.review !== 'inferred'),
  )
}

/**
 * What fits a part, by kind (catalogue order) and then relation (what works
 * first). Within a relation the server's order stays: reviewed before inferred.
 */
export function groupFits(results: readonly FitResult[]): FitGroup[] {
  return PART_KINDS.flatMap((kind) => {
    const ofKind = results.filter((result) => result.part.kind === kind)
    if (ofKind.length === 0) return []
    const relations = RELATIONS.map((relation) => ({ relation, results: ofKind.filter((r) => r.relation === relation) })).filter(
      (group) => group.results.length > 0,
    )
    return [{ kind, total: ofKind.length, relations }]
  })
}

/** How many results each relation has under the other filters, for the filter's counts. */
export function relationCounts(results: readonly FitResult[], filters: FitFilters): Record<Relation, number> {
  const base = filterFits(results, { ...filters, relation: undefined })
  return Object.fromEntries(RELATIONS.map((relation) => [relation, base.filter((r) => r.relation === relation).length])) as Record<
    Relation,
    number
  >
}

/** Kinds present in the answer, for the kind filter's options. */
export function kindsIn(results: readonly FitResult[]): PartKind[] {
  return PART_KINDS.filter((kind) => results.some((result) => result.part.kind === kind))
}
