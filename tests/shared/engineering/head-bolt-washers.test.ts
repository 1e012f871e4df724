import { describe, expect, it } from 'vitest'
import { planHeadBoltWashers, type WasherStackInput } from '../../../shared/engineering/head-bolt-washers'

// Blind-hole rule and washers under one bolt: common practice; no published source.
// The bolt of the fastener tests: M10×1.5 into aluminium, 110 mm long, 1.0 mm compressed gasket, 2.0 mm
// standard washer, 35 mm tapped depth. Hand-worked limits: engagement ≥ 2.0 · 10 = 20 mm; projection
// ≤ 35 − 2 · 1.5 = 32 mm; so at a boss of height h a bolt of (h + 3 + 20) to (h + 3 + 32) mm fits.
function head(change: Partial<WasherStackInput> = {}): WasherStackInput {
  return {
    positions: [
      { position: 'front left', bossHeightMm: 75 },
      { position: 'rear right', bossHeightMm: 68 },
    ],
    boltLengthMm: 110,
    diameterMm: 10,
    pitchMm: 1.5,
    compressedGasketMm: 1.0,
    tappedDepthMm: 35,
    material: 'aluminium',
    standardWasherMm: 2.0,
    stockedWashersMm: [2.0, 3.0, 4.5],
    torqueToYield: false,
    ...change,
  }
}

function within(actual: number, expected: number, tolerance = 1e-9): void {
  expect(Math.abs(actual - expected)).toBeLessThanOrEqual(tolerance)
}

describe('planHeadBoltWashers (common practice)', () => {
  it('leaves a bolt alone where it fits: boss 75 mm, grip 78 mm, 32 mm in the hole (on the limit)', () => {
    const [front] = planHeadBoltWashers(head()).positions
    expect(front?.fix).toBe('none')
    expect(front?.washersMm).toEqual([])
    within(front?.check.projectionMm ?? Number.NaN, 32)
  })

  // Boss 68 mm sits 7 mm lower: 110 − 71 = 39 mm in the hole, 7 mm too deep. Stacks of up to two
  // stocked washers, thinnest first: 4.0, 5.0, 6.0, 6.5 leave 35, 34, 33, 32.5 mm (all bottom);
  // 4.5 + 3.0 = 7.5 mm leaves 31.5 mm, which is ≥ 20 mm engaged: that is the answer.
  it('puts 4.5 + 3.0 mm hardened washers under the bolt over the low boss only', () => {
    const [front, rear] = planHeadBoltWashers(head()).positions
    expect(rear).toMatchObject({ position: 'rear right', fix: 'washers', washersMm: [4.5, 3.0] })
    within(rear?.stackMm ?? Number.NaN, 7.5)
    within(rear?.check.projectionMm ?? Number.NaN, 31.5)
    expect(rear?.check.status).toBe('ok')
    expect(rear?.reason).toMatch(/add 2 hardened washers \(4\.5 mm \+ 3 mm\) under this bolt only/)
    expect(front?.washersMm).toEqual([])
  })

  it('prefers fewer washers to a thinner stack: with three allowed, still 4.5 + 3.0 rather than 3.0 + 2.0 + 2.0', () => {
    const rear = planHeadBoltWashers(head({ maxWashers: 3 })).positions[1]
    expect(rear?.washersMm).toEqual([4.5, 3.0])
  })

  it('uses one washer when one stocked thickness is enough: 7 mm leaves 32 mm in the hole', () => {
    const rear = planHeadBoltWashers(head({ stockedWashersMm: [8, 7, 2] })).positions[1]
    expect(rear).toMatchObject({ fix: 'washers', washersMm: [7] })
    expect(rear?.reason).toMatch(/one hardened washer/)
  })

  it('never puts washers under torque-to-yield bolts: answers the 91–103 mm bolt instead', () => {
    const rear = planHeadBoltWashers(head({ torqueToYield: true })).positions[1]
    expect(rear?.fix).toBe('bolt-length')
    expect(rear?.washersMm).toEqual([])
    // 68 + 3 + 20 = 91 and 68 + 3 + 32 = 103
    within(rear?.lengthRangeMm.min ?? Number.NaN, 91)
    within(rear?.lengthRangeMm.max ?? Number.NaN, 103)
    expect(rear?.reason).toMatch(/torque-to-yield/)
  })

  it('answers the bolt length when no stack of stocked washers is thick enough (two 2 mm = 4 mm < 7 mm)', () => {
    const rear = planHeadBoltWashers(head({ stockedWashersMm: [2] })).positions[1]
    expect(rear?.fix).toBe('bolt-length')
    expect(rear?.reason).toMatch(/no stack of stocked washers/)
  })

  it('refuses a washer so thick it leaves too little thread: 25 mm leaves 14 mm of the 20 mm needed', () => {
    const rear = planHeadBoltWashers(head({ stockedWashersMm: [25] })).positions[1]
    expect(rear?.fix).toBe('bolt-length')
  })

  // Boss 92 mm sits 17 mm higher: 110 − 95 = 15 mm engaged < 20 mm; a bolt of 115–127 mm fits.
  it('answers a longer bolt where the boss sits higher, since a washer cannot lengthen a bolt', () => {
    const plan = planHeadBoltWashers(head({ positions: [{ position: 'rear left', bossHeightMm: 92 }] }))
    const [rear] = plan.positions
    expect(rear?.fix).toBe('bolt-length')
    expect(rear?.check.status).toBe('too-short')
    expect(rear?.reason).toMatch(/washers cannot lengthen a bolt/)
    within(rear?.lengthRangeMm.min ?? Number.NaN, 115)
    within(rear?.lengthRangeMm.max ?? Number.NaN, 127)
  })

  // Boss 75: 98–110 mm; boss 68: 91–103 mm; both: 98–103 mm. Adding boss 92 (115–127 mm) leaves none.
  it('gives the one bolt length that fits every position, or null when the bosses differ too much', () => {
    expect(planHeadBoltWashers(head()).commonLengthRangeMm).toEqual({ min: 98, max: 103 })
    const spread = head({ positions: [...head().positions, { position: 'rear left', bossHeightMm: 92 }] })
    expect(planHeadBoltWashers(spread).commonLengthRangeMm).toBeNull()
  })

  // 20 mm tapped: deepest projection 20 − 3 = 17 mm < 20 mm engagement, whatever the length.
  it('says no bolt fits when the tapped hole is too shallow to engage enough thread', () => {
    const [front] = planHeadBoltWashers(head({ tappedDepthMm: 20 })).positions
    expect(front?.fix).toBe('no-length')
  })

  it.each([
    ['no positions', { positions: [] }, /at least one/],
    ['a zero washer in stock', { stockedWashersMm: [2, 0] }, /stockedWashersMm/],
    ['a negative boss height', { positions: [{ position: 'front left', bossHeightMm: -1 }] }, /front left/],
    ['half a washer allowed', { maxWashers: 1.5 }, /maxWashers/],
  ])('rejects %s with a RangeError naming it', (_label, change, message) => {
    expect(() => planHeadBoltWashers(head(change))).toThrow(message)
  })
})
