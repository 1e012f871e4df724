import type { FitGroupPage, Relation } from '@shared/schemas/fitment'
import { PART_KINDS, type PartKind } from '@shared/schemas/part-kinds'
import { RELATIONS } from '@shared/schemas/fitment'

export type FitFilters = { relation?: Relation; kind?: PartKind; inferred: boolean; inStock?: boolean; page: number }

/** One kind of answers, by relation; each relation holds its reviewed and its inferred page. */
export type FitGroup = {
  kind: PartKind
  total: number
  relations: { relation: Relation; total: number; sections: FitGroupPage[] }[]
}

export function filterGroups(groups: readonly FitGroupPage[], filters: Omit<FitFilters, 'page'>): FitGroupPage[] {
  return groups.filter(
    (group) =>
      group.total > 0 &&
      (!filters.relation || group.relation === filters.relation) &&
      (!filters.kind || group.kind === filters.kind) &&
      (filters.inferred || group.source !== 'inferred'),
  )
}

/**
 * What fits a part, by kind (catalogue order) and then relation (what works
 * first); within a relation the server's order stays: reviewed before inferred.
 */
export function groupFits(groups: readonly FitGroupPage[]): FitGroup[] {
  return PART_KINDS.flatMap((kind) => {
    const ofKind = groups.filter((group) => group.kind === kind)
    if (ofKind.length === 0) return []
    const relations = RELATIONS.flatMap((relation) => {
      const sections = ofKind.filter((group) => group.relation === relation)
      return sections.length ? [{ relation, total: sum(sections), sections }] : []
    })
    return [{ kind, total: sum(ofKind), relations }]
  })
}

/** How many answers each relation has under the other filters, for the filter's counts. */
export function relationCounts(groups: readonly FitGroupPage[], filters: Omit<FitFilters, 'page'>): Record<Relation, number> {
  const base = filterGroups(groups, { ...filters, relation: undefined })
  return Object.fromEntries(RELATIONS.map((relation) => [relation, sum(base.filter((g) => g.relation === relation))])) as Record<
    Relation,
    number
  >
}

/** Kinds present in the answer, for the kind filter's options. */
export function kindsIn(groups: readonly FitGroupPage[]): PartKind[] {
  return PART_KINDS.filter((kind) => groups.some((group) => group.kind === kind && group.total > 0))
}

/** The overview's groups with the one (kind, relation) being paged replaced by the page asked for. */
export function withPage(overview: readonly FitGroupPage[], page: readonly FitGroupPage[] | null): FitGroupPage[] {
  if (!page || page.length === 0) return [...overview]
  const paged = (group: FitGroupPage) => page.some((other) => other.kind === group.kind && other.relation === group.relation)
  return [...overview.filter((group) => !paged(group)), ...page]
}

function sum(groups: readonly FitGroupPage[]): number {
  return groups.reduce((total, group) => total + group.total, 0)
}
