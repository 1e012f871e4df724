import { describe, expect, it } from 'vitest'
import type { FitGroupPage } from '@shared/schemas/fitment'
import { filterGroups, groupFits, kindsIn, relationCounts, summariseFits, withPage } from '@/lib/fit-groups'
import { makeFit, makePart } from '../../helpers/client-factories'

function group(
  kind: FitGroupPage['kind'],
  relation: FitGroupPage['relation'],
  source: FitGroupPage['source'],
  numbers: string[],
  total = numbers.length,
  offset = 0,
): FitGroupPage {
  const review = source === 'inferred' ? 'inferred' : 'approved'
  return { kind, relation, source, total, offset, results: numbers.map((n) => makeFit(makePart(n, kind), relation, review)) }
}

describe('what fits, grouped and filtered', () => {
  const groups = [
    group('block', 'fits', 'reviewed', ['ZX-BL-1']),
    group('block', 'fits', 'inferred', ['ZX-BL-3'], 40),
    group('block', 'fits-with-modification', 'reviewed', ['ZX-BL-2']),
    group('head-gasket', 'fits', 'inferred', ['ZX-HG-1']),
    group('intake-manifold', 'does-not-fit', 'inferred', ['ZX-IM-1'], 3),
  ]

  it('groups by kind in catalogue order, then by relation, keeping reviewed before inferred and the totals of the server', () => {
    const grouped = groupFits(groups)
    expect(grouped.map((g) => [g.kind, g.total])).toEqual([
      ['block', 42],
      ['head-gasket', 1],
      ['intake-manifold', 3],
    ])
    expect(grouped[0]?.relations.map((sub) => [sub.relation, sub.total, sub.sections.map((s) => s.source)])).toEqual([
      ['fits', 41, ['reviewed', 'inferred']],
      ['fits-with-modification', 1, ['reviewed']],
    ])
  })

  it('filters by relation, kind and whether rule-inferred answers count', () => {
    const numbers = (list: FitGroupPage[]) => list.flatMap((g) => g.results.map((r) => r.part.partNumber))
    expect(numbers(filterGroups(groups, { relation: 'fits', inferred: true }))).toEqual(['ZX-BL-1', 'ZX-BL-3', 'ZX-HG-1'])
    expect(numbers(filterGroups(groups, { kind: 'block', inferred: false }))).toEqual(['ZX-BL-1', 'ZX-BL-2'])
  })

  it('counts each relation from the group totals under the other filters, so the relation buttons show what they would give', () => {
    expect(relationCounts(groups, { relation: 'does-not-fit', kind: 'block', inferred: true })).toEqual({
      fits: 41,
      'fits-with-modification': 1,
      'does-not-fit': 0,
    })
    expect(relationCounts(groups, { inferred: false })).toEqual({ fits: 1, 'fits-with-modification': 1, 'does-not-fit': 0 })
  })

  it('offers only the kinds present in the answer', () => {
    expect(kindsIn(groups)).toEqual(['block', 'head-gasket', 'intake-manifold'])
  })

  it('shows a later page of one kind and relation in place of its first page, leaving the other groups as they were', () => {
    const second = [group('block', 'fits', 'inferred', ['ZX-BL-40'], 40, 20)]
    const merged = withPage(groups, second)
    const blockFits = groupFits(merged)[0]!.relations[0]!
    expect(blockFits.sections.map((s) => [s.source, s.offset, s.results.map((r) => r.part.partNumber)])).toEqual([
      ['inferred', 20, ['ZX-BL-40']],
    ])
    expect(merged.filter((g) => g.kind !== 'block' || g.relation !== 'fits')).toEqual(
      groups.filter((g) => g.kind !== 'block' || g.relation !== 'fits'),
    )
  })

  it('summarises each kind by relation and source, kinds with reviewed fits first, whatever kind or relation is chosen', () => {
    const rows = summariseFits(groups, { kind: 'block', relation: 'does-not-fit', inferred: true })
    expect(rows.map((row) => [row.kind, row.reviewed, row.inferred])).toEqual([
      ['block', 2, 40],
      ['head-gasket', 0, 1],
      ['intake-manifold', 0, 3],
    ])
    expect(rows[0]?.cells).toEqual({
      fits: { reviewed: 1, inferred: 40 },
      'fits-with-modification': { reviewed: 1, inferred: 0 },
      'does-not-fit': { reviewed: 0, inferred: 0 },
    })
  })

  it('puts a kind known only from reviewed does-not-fit links after the kinds with reviewed fits, and leaves out inferred answers when they are hidden', () => {
    const more = [
      group('head', 'does-not-fit', 'reviewed', ['ZX-HD-1']),
      group('head-gasket', 'fits', 'reviewed', ['ZX-HG-2']),
      group('block', 'fits', 'inferred', ['ZX-BL-3'], 7),
    ]
    const rows = summariseFits(more, { inferred: false })
    // The head comes first in catalogue order, but has no reviewed fit.
    expect(rows.map((row) => row.kind)).toEqual(['head-gasket', 'head'])
    expect(rows.every((row) => row.inferred === 0)).toBe(true)
  })
})
