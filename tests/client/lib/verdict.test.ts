import { describe, expect, it } from 'vitest'
import type { AppliedModification } from '@shared/schemas/build'
import { fillGapsSummary, missingSlotLabels, verdictDetail, verdictHeadline } from '@/lib/verdict'
import { makeEvaluation, makePair } from '../../helpers/client-factories'

function makeModification(name: string): AppliedModification {
  return {
    name,
    title: `${name} title`,
    summary: '',
    steps: [],
    extraParts: [],
    consumables: [],
    skillLevel: 'skilled',
    timeMinutes: null,
    cautions: [],
    status: 'approved',
    slots: ['head', 'block'],
    reason: '',
  }
}

describe('verdictHeadline', () => {
  it.each([
    ['fits', false, 'The build fits'],
    ['fits', true, 'The parts chosen so far fit'],
    ['does-not-fit', true, 'The parts chosen so far do not fit'],
    ['unknown', true, 'No verdict yet'],
  ] as const)('words %s (slots empty: %s) as "%s"', (verdict, partial, words) => {
    expect(verdictHeadline(verdict, partial)).toBe(words)
  })
})

describe('verdictDetail', () => {
  it('names only the pairs that do not fit when the build does not fit', () => {
    const pairs = [
      makePair(['head', 'block'], 'fits', 'Head on block'),
      makePair(['cam-gear', 'head'], 'does-not-fit', 'Cam gear on head'),
      makePair(['injector', 'head'], 'does-not-fit', 'Injectors in head'),
    ]
    expect(verdictDetail(makeEvaluation({ verdict: 'does-not-fit', pairs }))).toBe('Does not fit: Cam gear on head; Injectors in head.')
  })

  it.each([
    [1, '1 modification needed: see the checklist.'],
    [3, '3 modifications needed: see the checklist.'],
  ])('counts %i needed modification(s)', (count, words) => {
    const modifications = Array.from({ length: count }, (_, index) => makeModification(`mod-${index}`))
    expect(verdictDetail(makeEvaluation({ verdict: 'fits-with-modification', modifications }))).toBe(words)
  })

  it('names the pairs no link or rule covers when the verdict is unknown', () => {
    const pairs = [makePair(['head', 'block'], 'unknown', 'Head on block')]
    expect(verdictDetail(makeEvaluation({ verdict: 'unknown', pairs }))).toBe(
      'No catalogue link or rule covers Head on block: check by hand.',
    )
  })

  it('asks for a mating part when the verdict is unknown because no pair was judged', () => {
    expect(verdictDetail(makeEvaluation({ verdict: 'unknown', pairs: [] }))).toContain('Choose a part for a slot that mates')
  })

  it.each([
    [1, 'The one mating pair fits as it is.'],
    [2, 'All 2 mating pairs fit as they are.'],
  ])('says all %i pair(s) fit when the build fits', (count, words) => {
    const pairs = Array.from({ length: count }, (_, index) => makePair(['head', 'block'], 'fits', `Pair ${index}`))
    expect(verdictDetail(makeEvaluation({ verdict: 'fits', pairs }))).toBe(words)
  })
})

describe('missingSlotLabels', () => {
  it('gives labels in template order whatever order the ids come in, and skips unknown ids', () => {
    expect(missingSlotLabels(['injector', 'wheel', 'block'])).toEqual(['Cylinder block', 'Injectors'])
  })
})

describe('fillGapsSummary', () => {
  it('counts the filled slots and names each still empty slot with the reason', () => {
    const summary = fillGapsSummary({
      filled: [
        { slot: 'head', partNumber: 'TK18-HD-0001' },
        { slot: 'injector', partNumber: 'TK18-IN-0002' },
      ],
      unfilled: [{ slot: 'oil-restrictor', note: 'nothing in the catalogue fits the block' }],
    })
    expect(summary).toEqual({
      severity: 'success',
      summary: 'Filled 2 slots',
      detail: 'Still empty: Oil feed restrictor (nothing in the catalogue fits the block)',
    })
  })

  it('says one slot in the singular and that every slot has a part when none is left', () => {
    expect(fillGapsSummary({ filled: [{ slot: 'head', partNumber: 'TK18-HD-0001' }], unfilled: [] })).toEqual({
      severity: 'success',
      summary: 'Filled 1 slot',
      detail: 'Every slot now has a part.',
    })
  })

  it('is a note, not a success, when nothing could be filled', () => {
    const summary = fillGapsSummary({ filled: [], unfilled: [{ slot: 'head', note: 'choose a block first' }] })
    expect(summary.severity).toBe('info')
    expect(summary.summary).toBe('No empty slot could be filled')
  })
})

describe('fillGapsSummary with parts passed over', () => {
  it('names the part fill the gaps passed over and why', () => {
    const summary = fillGapsSummary({
      filled: [{ slot: 'ecu', partNumber: 'TM-EC-1896' }],
      unfilled: [],
      skipped: [{ slot: 'ecu', partNumber: 'TM-EC-1800', reason: 'Ranked lower, not road-legal: OBD-II required.' }],
    })
    expect(summary.detail).toContain('Passed over: TM-EC-1800')
    expect(summary.detail).toContain('not road-legal')
  })
})
