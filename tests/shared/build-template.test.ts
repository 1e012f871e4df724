import { describe, expect, it } from 'vitest'
import { BUILD_SLOTS, MATING_PAIRS, matingSlots, mates, pairKey } from '../../shared/build-template'
import { PART_KINDS } from '../../shared/schemas/part-kinds'

describe('build template', () => {
  it('has one slot per part kind except "other"', () => {
    expect(BUILD_SLOTS.map((s) => s.id).sort()).toEqual(PART_KINDS.filter((k) => k !== 'other').sort())
  })

  it('names only template slots in mating pairs, each pair once and never a slot with itself', () => {
    const ids = new Set(BUILD_SLOTS.map((s) => s.id))
    const keys = MATING_PAIRS.map((p) => pairKey(p.slots[0], p.slots[1]))
    expect(new Set(keys).size).toBe(keys.length)
    for (const { slots } of MATING_PAIRS) {
      expect(ids.has(slots[0]) && ids.has(slots[1])).toBe(true)
      expect(slots[0]).not.toBe(slots[1])
    }
  })

  it('leaves no slot without a mating slot', () => {
    for (const slot of BUILD_SLOTS) expect(matingSlots(slot.id).length, slot.id).toBeGreaterThan(0)
  })

  it('treats mating as mutual (the head mates with the block and the block with the head)', () => {
    expect(mates('head', 'block')).toBe(true)
    expect(mates('block', 'head')).toBe(true)
    expect(mates('distributor', 'head')).toBe(true)
    expect(mates('injector', 'block')).toBe(false)
    expect(matingSlots('block')).toContain('head')
  })
})
