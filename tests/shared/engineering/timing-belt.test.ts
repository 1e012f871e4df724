import fc from 'fast-check'
import { describe, expect, it } from 'vitest'
import {
  beltTeethForCentre,
  camPulleyTeeth,
  centreDistanceForBeltMm,
  openBeltLengthMm,
  pitchDiameterMm,
} from '../../../shared/engineering/timing-belt'

// Terms (pitch p, pitch length L = z·p, pitch diameter d = z·p/π): ISO 9010 [published]. The length
// L = 2C·cosφ + π(D+d)/2 + φ(D−d), φ = asin((D−d)/2C) is the geometry of two tangent runs and two arcs;
// every check value is hand-worked in the comment beside it, never taken from this code.
const ISO_9010 = 'terms: ISO 9010 [published]; geometry hand-worked'
const PITCH_MM = 9.525
const pair = { smallTeeth: 21, largeTeeth: 42, pitchMm: PITCH_MM }

function within(actual: number, expected: number, tolerance: number): void {
  expect(Math.abs(actual - expected)).toBeLessThanOrEqual(tolerance)
}

// 20 and 60 teeth at 8 mm pitch: d = 160/π, D = 480/π. At C = D − d = 320/π = 101.859 mm,
// sin φ = (D − d)/2C = 1/2, so φ = 30° = π/6 exactly and the trigonometry can be done by hand:
//   2C·cos φ   = 2 · (320/π) · (√3/2) = 320·√3/π = 176.425 mm
//   π(D + d)/2 = π · (640/π) / 2      = 320.000 mm
//   φ(D − d)   = (π/6) · (320/π)      =  53.333 mm
//   L = 549.759 mm = 68.720 teeth.
// The common approximation 2C + π(D+d)/2 + (D−d)²/4C = 2.25 · 101.859 + 320 = 549.183 mm is 0.58 mm
// short here, so this case fails if the exact formula is swapped for it.
const thirtyDegrees = { smallTeeth: 20, largeTeeth: 60, pitchMm: 8 }
const THIRTY_DEGREE_CENTRE_MM = 101.859

describe(`two-pulley belt geometry (${ISO_9010})`, () => {
  it('20 and 60 teeth at 8 mm pitch, 101.859 mm centres (φ = 30°): L 549.759 mm, 68.720 teeth', () => {
    within(openBeltLengthMm({ ...thirtyDegrees, centreMm: THIRTY_DEGREE_CENTRE_MM }), 549.759, 0.002)
    within(beltTeethForCentre({ ...thirtyDegrees, centreMm: THIRTY_DEGREE_CENTRE_MM }), 68.72, 0.001)
  })

  it('a belt of 68.7198 teeth on the same pulleys sets the centres back at 101.859 mm', () => {
    within(centreDistanceForBeltMm({ ...thirtyDegrees, beltTeeth: 68.7198 }), THIRTY_DEGREE_CENTRE_MM, 0.001)
  })

  // 21 and 42 teeth at 9.525 mm: d = 63.670, D = 127.340 mm, C = 300 mm.
  //   sin φ = 63.670/600 = 0.106117, φ = 0.106317 rad
  //   2C·cos φ = 600 · 0.994354 = 596.612;  π(D+d)/2 = (21+42) · 9.525/2 = 300.038;  φ(D−d) = 6.769
  //   L = 903.419 mm = 94.85 teeth. (The approximation gives 903.416: the 0.001 mm tolerance tells them apart.)
  it('21 and 42 teeth at 9.525 mm pitch, 300 mm centres: L 903.419 mm, 94.85 teeth', () => {
    within(openBeltLengthMm({ ...pair, centreMm: 300 }), 903.419, 0.001)
    within(beltTeethForCentre({ ...pair, centreMm: 300 }), 94.85, 0.005)
  })

  // 95 · 9.525 = 904.875 mm, 1.456 mm longer than at 300 mm; dL/dC = 2·cos φ = 1.9887, so C ≈ 300 + 0.732.
  it('a 95-tooth belt (904.875 mm pitch length) sets the centres at 300.732 mm', () => {
    within(centreDistanceForBeltMm({ ...pair, beltTeeth: 95 }), 300.732, 0.001)
  })

  it('pitch diameter is z·p/π: 21 teeth at 9.525 mm is 200.025/π = 63.670 mm', () => {
    within(pitchDiameterMm(21, PITCH_MM), 63.67, 0.001)
  })

  it('four-stroke: the cam pulley has twice the crank teeth', () => {
    expect(camPulleyTeeth(21)).toBe(42)
  })

  it('equal pulleys reduce to the straight-run formula L = 2C + πd', () => {
    fc.assert(
      fc.property(fc.integer({ min: 10, max: 60 }), fc.double({ min: 150, max: 600, noNaN: true }), (teeth, centreMm) => {
        const d = (teeth * PITCH_MM) / Math.PI
        within(openBeltLengthMm({ smallTeeth: teeth, largeTeeth: teeth, pitchMm: PITCH_MM, centreMm }), 2 * centreMm + Math.PI * d, 1e-9)
      }),
    )
  })

  it('gives the same length whichever pulley is named first', () => {
    within(
      openBeltLengthMm({ smallTeeth: 42, largeTeeth: 21, pitchMm: PITCH_MM, centreMm: 300 }),
      openBeltLengthMm({ ...pair, centreMm: 300 }),
      1e-9,
    )
  })

  const drive = fc.record({
    smallTeeth: fc.integer({ min: 12, max: 40 }),
    extraTeeth: fc.integer({ min: 0, max: 40 }),
    pitchMm: fc.constantFrom(8, 9.525, 9.525, 10),
  })

  it('centreDistanceForBeltMm inverts openBeltLengthMm to 1e-6 mm', () => {
    fc.assert(
      fc.property(drive, fc.double({ min: 0.6, max: 4, noNaN: true }), ({ smallTeeth, extraTeeth, pitchMm }, spread) => {
        const largeTeeth = smallTeeth + extraTeeth
        const centreMm = spread * pitchDiameterMm(largeTeeth, pitchMm)
        const beltTeeth = beltTeethForCentre({ smallTeeth, largeTeeth, pitchMm, centreMm })
        within(centreDistanceForBeltMm({ smallTeeth, largeTeeth, pitchMm, beltTeeth }), centreMm, 1e-6)
      }),
    )
  })

  it('a longer belt always moves the pulleys apart', () => {
    fc.assert(
      fc.property(drive, fc.integer({ min: 0, max: 60 }), ({ smallTeeth, extraTeeth, pitchMm }, added) => {
        const largeTeeth = smallTeeth + extraTeeth
        const shortest = Math.ceil((Math.PI * pitchDiameterMm(largeTeeth, pitchMm)) / pitchMm) + 1
        const near = centreDistanceForBeltMm({ smallTeeth, largeTeeth, pitchMm, beltTeeth: shortest + added })
        const far = centreDistanceForBeltMm({ smallTeeth, largeTeeth, pitchMm, beltTeeth: shortest + added + 1 })
        expect(far).toBeGreaterThan(near)
      }),
    )
  })

  it('refuses a belt too short to go round the large pulley', () => {
    expect(() => centreDistanceForBeltMm({ ...pair, beltTeeth: 40 })).toThrow(/too short/)
  })

  it('refuses centres closer than the wrap formula allows', () => {
    expect(() => openBeltLengthMm({ ...pair, centreMm: 10 })).toThrow(RangeError)
  })

  it.each([[0], [2.5], [-3]])('rejects %f teeth', (teeth) => {
    expect(() => pitchDiameterMm(teeth, PITCH_MM)).toThrow(RangeError)
  })
})
