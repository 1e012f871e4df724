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

/** One kind's answers at a glance: per relation, how many are reviewed and how many the rules inferred. */
export type FitSummaryRow = {
  kind: PartKind
  cells: Record<Relation, { reviewed: number; inferred: number }>
  reviewed: number
  inferred: number
}

/**
 * The part page's summary, before the lists: every kind with answers under the
 * inferred and stock filters (the kind and relation filters are what the
 * summary lets a counter choose, so they are not applied). Kinds with reviewed
 * fits come first, in catalogue order, then those known only by the rules.
 */
export function summariseFits(groups: readonly FitGroupPage[], filters: Omit<FitFilters, 'page'>): FitSummaryRow[] {
  const base = filterGroups(groups, { inferred: filters.inferred })
  const rows = kindsIn(base).map((kind) => {
    const cells = Object.fromEntries(RELATIONS.map((relation) => [relation, { reviewed: 0, inferred: 0 }])) as FitSummaryRow['cells']
    for (const group of base) if (group.kind === kind) cells[group.relation][group.source] += group.total
    const total = (source: FitGroupPage['source']) => RELATIONS.reduce((sum, relation) => sum + cells[relation][source], 0)
    return { kind, cells, reviewed: total('reviewed'), inferred: total('inferred') }
  })
  const reviewedFits = (row: FitSummaryRow) => row.cells.fits.reviewed + row.cells['fits-with-modification'].reviewed > 0
  return [...rows.filter(reviewedFits), ...rows.filter((row) => !reviewedFits(row))]
}
