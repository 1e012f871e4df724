import { describe, expect, it } from 'vitest'
import { filterFits, groupFits, kindsIn, relationCounts } from '@/lib/fit-groups'
import { makeFit, makePart } from '../../helpers/client-factories'

describe('what fits, grouped and filtered', () => {
  const results = [
    makeFit(makePart('ZX-BL-1', 'block'), 'fits'),
    makeFit(makePart('ZX-HG-1', 'head-gasket'), 'fits', 'inferred'),
    makeFit(makePart('ZX-BL-2', 'block'), 'fits-with-modification'),
    makeFit(makePart('ZX-BL-3', 'block'), 'fits', 'inferred'),
    makeFit(makePart('ZX-IM-1', 'intake-manifold'), 'does-not-fit', 'inferred'),
  ]

  it('groups by kind in catalogue order, then by relation with what works first, keeping the server order inside', () => {
    const groups = groupFits(results)
    expect(groups.map((group) => [group.kind, group.total])).toEqual([
      ['block', 3],
      ['head-gasket', 1],
      ['intake-manifold', 1],
    ])
    expect(groups[0]?.relations.map((sub) => [sub.relation, sub.results.map((r) => r.part.partNumber)])).toEqual([
      ['fits', ['ZX-BL-1', 'ZX-BL-3']],
      ['fits-with-modification', ['ZX-BL-2']],
    ])
  })

  it('filters by relation, kind and whether rule-inferred answers count', () => {
    expect(filterFits(results, { relation: 'fits', inferred: true }).map((r) => r.part.partNumber)).toEqual(['ZX-BL-1', 'ZX-HG-1', 'ZX-BL-3'])
    expect(filterFits(results, { kind: 'block', inferred: false }).map((r) => r.part.partNumber)).toEqual(['ZX-BL-1', 'ZX-BL-2'])
  })

  it('counts each relation under the other filters, so the relation buttons show what they would give', () => {
    expect(relationCounts(results, { relation: 'does-not-fit', kind: 'block', inferred: true })).toEqual({
      fits: 2,
      'fits-with-modification': 1,
      'does-not-fit': 0,
    })
  })

  it('offers only the kinds present in the answer', () => {
    expect(kindsIn(results)).toEqual(['block', 'head-gasket', 'intake-manifold'])
  })
})
