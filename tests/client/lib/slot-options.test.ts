import { describe, expect, it } from 'vitest'
import { slotOptionGroups, typedChoice } from '@/lib/slot-options'
import { slotStatuses } from '@/lib/slot-status'
import { makeCandidate, makePair, makePart } from '../../helpers/client-factories'

describe('slot picker choices', () => {
  const fitting = makePart('ZX-HG-1', 'head-gasket', { marks: [{ type: 'stamped', value: 'G77' }] })
  const withMod = makePart('ZX-HG-2', 'head-gasket')
  const other = makePart('ZX-HG-9', 'head-gasket')

  it('lists suggested parts first with their relation, then the other parts of the kind marked as not suggested', () => {
    const groups = slotOptionGroups(
      'head-gasket',
      '',
      [makeCandidate(fitting), makeCandidate(withMod, 'fits-with-modification')],
      [fitting, withMod, other],
    )
    expect(groups.map((g) => [g.label, g.items.map((o) => [o.part.partNumber, o.suggested, o.relation])])).toEqual([
      [
        'Fit the parts already chosen',
        [
          ['ZX-HG-1', true, 'fits'],
          ['ZX-HG-2', true, 'fits-with-modification'],
        ],
      ],
      ['Other head gasket parts: not suggested, checked once chosen', [['ZX-HG-9', false, undefined]]],
    ])
  })

  it('narrows the suggestions to what was typed, a mark included', () => {
    const groups = slotOptionGroups('head-gasket', 'g77', [makeCandidate(fitting), makeCandidate(withMod)], [])
    expect(groups[0]?.items.map((o) => o.part.partNumber)).toEqual(['ZX-HG-1'])
  })

  it('names the group plainly and marks no part as not suggested when no slot it mates with is chosen yet', () => {
    const [group] = slotOptionGroups('head-gasket', '', [], [other])
    expect(group?.label).toBe('All matching head gasket parts')
    expect(group?.items[0]?.note).toBeUndefined()
  })

  it('marks a searched part that is not among the suggestions', () => {
    const groups = slotOptionGroups('head-gasket', '', [makeCandidate(fitting)], [other])
    expect(groups[1]?.items[0]?.note).toBe('not suggested')
  })
})

describe('slot status', () => {
  it('gives each slot the worst relation of its pairs and names the pairs that set it', () => {
    const statuses = slotStatuses([
      makePair(['head', 'block'], 'fits-with-modification', 'Head on block'),
      makePair(['distributor', 'head'], 'does-not-fit', 'Distributor on head'),
      makePair(['head-gasket', 'block'], 'fits', 'Gasket on block'),
    ])
    expect(statuses.head).toEqual({ verdict: 'does-not-fit', text: 'Distributor on head' })
    expect(statuses.block).toEqual({ verdict: 'fits-with-modification', text: 'Head on block' })
    expect(statuses['head-gasket']).toEqual({ verdict: 'fits', text: 'Fits its 1 mating part' })
  })
})

describe('Enter on typed text in a slot picker', () => {
  const head = (partNumber: string) => makePart(partNumber, 'head')
  // The list shown at focus (an empty search) puts a fitting head first.
  const atFocus = slotOptionGroups('head', '', [makeCandidate(head('TM-HD-2000'))], [head('TM-HD-1800'), head('TM-HD-2000')])

  it('takes the typed number when the list on show answers an older search (the whole value arrived at once)', () => {
    expect(typedChoice('TM-HD-1800', slotOptionGroups('head', '', [makeCandidate(head('TM-HD-2000'))], []), '')).toBe('TM-HD-1800')
  })

  it('takes the option with exactly the typed number, whatever the spelling, even when it is not first', () => {
    expect(typedChoice('tm hd 1800', atFocus, '')).toBe('TM-HD-1800')
    expect(typedChoice('TM-HD-1800', atFocus, 'TM-HD-1800')).toBe('TM-HD-1800')
  })

  it('leaves Enter to the list when it answers what was typed and nothing matches exactly (a partial number)', () => {
    expect(typedChoice('TM-HD', atFocus, 'TM-HD')).toBeNull()
  })

  it('takes a mark as typed before any answer came, for the server to resolve', () => {
    expect(typedChoice(' 2HX ', [], null)).toBe('2HX')
    expect(typedChoice('   ', atFocus, '')).toBeNull()
  })
})
