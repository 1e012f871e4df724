import fc from 'fast-check'
import { describe, expect, it } from 'vitest'
import { pageOfHits, type PartDirectory } from '../../server/catalogue/search-order'
import type { PartKind } from '../../shared/schemas/part-kinds'

const KINDS: PartKind[] = ['head', 'block', 'injector']

function directoryOf(numbers: string[], kinds: PartKind[]): PartDirectory {
  return {
    hasPart: (id) => id < numbers.length,
    partNumberOf: (id) => numbers[id]!,
    kindOf: (id) => kinds[id]!,
  }
}

describe('pageOfHits against sorting every hit', () => {
  it('pages each part once, in its best tier, by part number within a tier, of the kind asked', () => {
    const catalogue = fc.integer({ min: 1, max: 300 }).chain((size) =>
      fc.record({
        numbers: fc.array(fc.stringMatching(/^[A-C][0-9]{1,3}$/), { minLength: size, maxLength: size, size: 'max' }),
        kinds: fc.array(fc.constantFrom(...KINDS), { minLength: size, maxLength: size }),
        tiers: fc.array(fc.array(fc.integer({ min: 0, max: size + 3 }), { maxLength: 250, size: 'max' }), { maxLength: 3 }),
        kind: fc.option(fc.constantFrom(...KINDS), { nil: undefined }),
        offset: fc.integer({ min: 0, max: 40 }),
        limit: fc.integer({ min: 1, max: 12 }),
      }),
    )
    fc.assert(
      fc.property(catalogue, ({ numbers, kinds, tiers, kind, offset, limit }) => {
        // Distinct numbers, as the catalogue has them.
        const unique = numbers.map((number, id) => `${number}-${id}`)
        const seen = new Set<number>()
        const expected: { id: number; tier: number }[] = []
        tiers.forEach((tier, index) => {
          for (const id of tier) {
            if (id >= unique.length || seen.has(id)) continue
            seen.add(id)
            if (!kind || kinds[id] === kind) expected.push({ id, tier: index })
          }
        })
        expected.sort((a, b) => a.tier - b.tier || (unique[a.id]! < unique[b.id]! ? -1 : 1))
        const page = pageOfHits(tiers, directoryOf(unique, kinds), { kind, offset, limit })
        expect(page.total).toBe(expected.length)
        expect(page.ids).toEqual(expected.slice(offset, offset + limit).map((hit) => hit.id))
      }),
      { numRuns: 300 },
    )
  })
})
