import { describe, expect, it } from 'vitest'
import type { Completion } from '../../shared/schemas/build'
import { createsDeadEnd, nextSlotToFill, unfilledNotes } from '../../shared/build-fill'
import { makeCandidate, makePart } from '../helpers/client-factories'

const candidate = (partNumber: string, kind: Parameters<typeof makePart>[1]) => makeCandidate(makePart(partNumber, kind))

describe('fill the gaps', () => {
  it('fills first the slot with the most chosen mates, template order among equals', () => {
    const completion: Completion = {
      slots: {
        'crank-pulley': { matesWith: ['block'], candidates: [candidate('ZX-CP-1', 'crank-pulley')] },
        'head-bolt': { matesWith: ['block', 'head'], candidates: [candidate('ZX-HB-1', 'head-bolt')] },
        'head-gasket': { matesWith: ['block', 'head'], candidates: [candidate('ZX-HG-1', 'head-gasket')] },
        'timing-belt': { matesWith: [], candidates: [], note: 'Choose a part for a slot it mates with first.' },
      },
    }
    expect(nextSlotToFill(completion)).toBe('head-gasket')
    expect(nextSlotToFill(completion, new Set(['head-gasket']))).toBe('head-bolt')
    expect(nextSlotToFill({ slots: { 'timing-belt': completion.slots['timing-belt']! } })).toBeNull()
  })

  it('rejects a choice that leaves an empty mate without any part that fits', () => {
    const before: Completion = { slots: { 'cam-gear': { matesWith: ['head'], candidates: [candidate('ZX-CG-1', 'cam-gear')] } } }
    const boxedIn: Completion = { slots: { 'cam-gear': { matesWith: ['head', 'crank-pulley'], candidates: [] } } }
    const open: Completion = {
      slots: { 'cam-gear': { matesWith: ['head', 'crank-pulley'], candidates: [candidate('ZX-CG-2', 'cam-gear')] } },
    }
    expect(createsDeadEnd('crank-pulley', before, boxedIn)).toBe(true)
    expect(createsDeadEnd('crank-pulley', before, open)).toBe(false)
  })

  it('does not hold against a choice a mate that was stuck already, nor a slot that does not mate with it', () => {
    const stuck: Completion = {
      slots: { 'cam-gear': { matesWith: ['head'], candidates: [] }, injector: { matesWith: ['ecu'], candidates: [] } },
    }
    expect(createsDeadEnd('crank-pulley', stuck, stuck)).toBe(false)
    const before: Completion = { slots: { injector: { matesWith: [], candidates: [] } } }
    const injectorStuck: Completion = { slots: { injector: { matesWith: ['ecu'], candidates: [] } } }
    expect(createsDeadEnd('crank-pulley', before, injectorStuck)).toBe(false)
    expect(createsDeadEnd('ecu', before, injectorStuck)).toBe(true)
  })

  it('says why each slot stayed empty, in template order', () => {
    const completion: Completion = {
      slots: {
        injector: { matesWith: ['ecu'], candidates: [] },
        'timing-belt': { matesWith: [], candidates: [], note: 'Choose a part for a slot it mates with first (cam-gear, crank-pulley).' },
        'cam-gear': { matesWith: ['head'], candidates: [candidate('ZX-CG-1', 'cam-gear')] },
      },
    }
    expect(unfilledNotes(completion, new Set(['cam-gear']))).toEqual([
      { slot: 'cam-gear', note: 'every candidate would leave a slot it mates with without a part that fits' },
      { slot: 'timing-belt', note: 'Choose a part for a slot it mates with first (cam-gear, crank-pulley).' },
      { slot: 'injector', note: 'no candidate fits the chosen parts' },
    ])
  })
})
