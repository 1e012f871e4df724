import fc from 'fast-check'
import { describe, expect, it } from 'vitest'
import {
  beltTeethForCentre,
  camPulleyTeeth,
  centreDistanceForBeltMm,
  openBeltLengthMm,
  pitchDiameterMm,
} from '../../../shared/engineering/timing-belt'

const ISO_9010 = 'ISO 9010, synchronous belt drives for automotive use [published]'
const PITCH_MM = 9.525
const pair = { smallTeeth: 21, largeTeeth: 42, pitchMm: PITCH_MM }

function within(actual: number, expected: number, tolerance: number): void {
  expect(Math.abs(actual - expected)).toBeLessThanOrEqual(tolerance)
}

describe(`two-pulley belt geometry (${ISO_9010})`, () => {
  it('21 and 42 teeth at 9.525 mm pitch, 300 mm centres: L 903.419 mm, 94.85 teeth', () => {
    within(openBeltLengthMm({ ...pair, centreMm: 300 }), 903.419, 0.01)
    within(beltTeethForCentre({ ...pair, centreMm: 300 }), 94.85, 0.005)
  })

  it('a 95-tooth belt (904.875 mm pitch length) sets the centres at 300.732 mm', () => {
    within(95 * PITCH_MM, 904.875, 1e-9)
    within(centreDistanceForBeltMm({ ...pair, beltTeeth: 95 }), 300.732, 0.01)
  })

  it('pitch diameter times π is the pitch circumference z·p', () => {
    within(pitchDiameterMm(21, PITCH_MM) * Math.PI, 21 * PITCH_MM, 1e-9)
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
