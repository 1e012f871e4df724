import fc from 'fast-check'
import { describe, expect, it } from 'vitest'
import {
  chamberForRatio,
  type CompressionInput,
  cylinderVolumeCc,
  staticCompressionRatio,
  sweptVolumeCc,
} from '../../../shared/engineering/compression'
import { inToMm } from '../../../shared/engineering/units'

const RATIO_TOLERANCE = 0.005
const CC_TOLERANCE = 0.001
// The formula is Heywood's (Internal Combustion Engine Fundamentals, sec. 2.2 [published]). Heywood
// prints no worked example for these builds, so every check value below is hand-worked from first
// principles in the comment beside it (π/4 = 0.785398); none was produced by running this code.
const HEYWOOD = 'formula: Heywood sec. 2.2 [published]; values hand-worked'

function within(actual: number, expected: number, tolerance: number): void {
  expect(Math.abs(actual - expected)).toBeLessThanOrEqual(tolerance)
}

function bottomEnd(change: Partial<CompressionInput> = {}): CompressionInput {
  return {
    boreMm: 86,
    strokeMm: 86,
    chamberCc: 45.0,
    gasketBoreMm: 87,
    gasketThicknessMm: 1.2,
    deckClearanceMm: 0.2,
    pistonVolumeCc: 5.0,
    ...change,
  }
}

const inchBuild: CompressionInput = {
  boreMm: inToMm(4.0),
  strokeMm: inToMm(3.48),
  chamberCc: 64,
  gasketBoreMm: inToMm(4.1),
  gasketThicknessMm: inToMm(0.041),
  deckClearanceMm: inToMm(0.025),
  pistonVolumeCc: 5,
}

describe(`staticCompressionRatio (${HEYWOOD})`, () => {
  // Vs  = π/4 · 86² · 86   = 0.785398 · 636,056 mm³ = 499,557 mm³ = 499.557 cc
  // gasket at ITS bore: π/4 · 87² · 1.2 = 0.785398 · 9,082.8 mm³ = 7.134 cc
  // deck at the CYLINDER bore: π/4 · 86² · 0.2 = 0.785398 · 1,479.2 mm³ = 1.162 cc
  // Vc  = 45 + 7.134 + 1.162 + 5 (dish) = 58.295 cc
  it('splits the clearance volume of the 86 × 86 mm bottom end into its parts', () => {
    const result = staticCompressionRatio(bottomEnd())
    within(result.sweptCc, 499.557, CC_TOLERANCE)
    within(result.gasketCc, 7.134, CC_TOLERANCE)
    within(result.deckCc, 1.162, CC_TOLERANCE)
    within(result.clearanceCc, 58.295, CC_TOLERANCE)
  })

  // CR = (Vs + Vc) / Vc with Vs 499.557 cc; gasket 0.7 mm = 0.785398 · 7,569 · 0.7 = 4.161 cc, 1.6 mm = 9.512 cc
  //   base: (499.557 + 58.295) / 58.295 = 9.569
  //   52 cc: Vc 65.295 → 564.852 / 65.295 = 8.651;  with 0.7 mm: Vc 62.323 → 561.880 / 62.323 = 9.016
  //   5 cc dome: Vc 58.295 − 10 = 48.295 → 547.852 / 48.295 = 11.344
  //   0.7 mm: Vc 55.323 → 10.030;  1.6 mm: Vc 60.673 → 9.234
  //   inch: Vs π/4 · 101.6² · 88.392 = 716.622 cc; gasket π/4 · 104.14² · 1.0414 = 8.870 cc;
  //         deck π/4 · 101.6² · 0.635 = 5.148 cc; Vc 64 + 8.870 + 5.148 + 5 = 83.019 → 799.641 / 83.019 = 9.632
  it.each([
    ['45 cc chamber, 1.2 mm gasket, 5 cc dish', 9.569, bottomEnd()],
    ['52 cc chamber (another head)', 8.651, bottomEnd({ chamberCc: 52 })],
    [
      '52 cc chamber with a 0.7 mm gasket: a gasket cannot fully make up for the head',
      9.016,
      bottomEnd({ chamberCc: 52, gasketThicknessMm: 0.7 }),
    ],
    ['45 cc chamber with a 5 cc dome instead of the dish', 11.344, bottomEnd({ pistonVolumeCc: -5 })],
    ['45 cc chamber, 5 cc dish, 0.7 mm gasket', 10.03, bottomEnd({ gasketThicknessMm: 0.7 })],
    ['45 cc chamber, 5 cc dish, 1.6 mm gasket', 9.234, bottomEnd({ gasketThicknessMm: 1.6 })],
    ['inch build: 4.000 × 3.480 in, 64 cc, 4.100 × 0.041 in gasket, 0.025 in deck, 5 cc reliefs', 9.632, inchBuild],
  ])('%s gives %f:1', (_label, expected, input) => {
    within(staticCompressionRatio(input).ratio, expected, RATIO_TOLERANCE)
  })

  it('falls as the gasket gets thicker', () => {
    fc.assert(
      fc.property(fc.double({ min: 0, max: 3, noNaN: true }), fc.double({ min: 0.01, max: 2, noNaN: true }), (thin, extra) => {
        const thinner = staticCompressionRatio(bottomEnd({ gasketThicknessMm: thin })).ratio
        const thicker = staticCompressionRatio(bottomEnd({ gasketThicknessMm: thin + extra })).ratio
        expect(thicker).toBeLessThan(thinner)
      }),
    )
  })

  it('rises as the dish shrinks towards a dome', () => {
    fc.assert(
      fc.property(fc.double({ min: -20, max: 20, noNaN: true }), (piston) => {
        const smaller = staticCompressionRatio(bottomEnd({ pistonVolumeCc: piston - 1 })).ratio
        const larger = staticCompressionRatio(bottomEnd({ pistonVolumeCc: piston })).ratio
        expect(smaller).toBeGreaterThan(larger)
      }),
    )
  })

  it('throws a RangeError naming the problem when a dome fills the chamber', () => {
    expect(() => staticCompressionRatio(bottomEnd({ pistonVolumeCc: -60 }))).toThrow(/clearance volume must be positive/i)
  })

  it.each([
    ['boreMm', { boreMm: 0 }],
    ['strokeMm', { strokeMm: -86 }],
    ['chamberCc', { chamberCc: 0 }],
    ['gasketBoreMm', { gasketBoreMm: Number.NaN }],
    ['gasketThicknessMm', { gasketThicknessMm: -0.1 }],
    ['deckClearanceMm', { deckClearanceMm: Number.POSITIVE_INFINITY }],
  ])('rejects a bad %s with a RangeError that names it', (name, change) => {
    expect(() => staticCompressionRatio(bottomEnd(change))).toThrow(RangeError)
    expect(() => staticCompressionRatio(bottomEnd(change))).toThrow(name)
  })

  it('counts a proud piston (negative deck clearance) as lost volume', () => {
    const below = staticCompressionRatio(bottomEnd({ deckClearanceMm: 0.2 }))
    const proud = staticCompressionRatio(bottomEnd({ deckClearanceMm: -0.2 }))
    // π/4 · 86² · (±0.2) = ±1.162 cc
    within(below.deckCc, 1.162, CC_TOLERANCE)
    within(proud.deckCc, -1.162, CC_TOLERANCE)
    expect(proud.ratio).toBeGreaterThan(below.ratio)
  })
})

describe(`chamberForRatio (${HEYWOOD})`, () => {
  // Vc = Vs / (CR − 1) = 499.557 / 9 = 55.506 cc; chamber = 55.506 − 7.134 − 1.162 − 5 = 42.211 cc
  it('finds the 42.211 cc chamber that gives 10.0:1 on the 86 × 86 mm bottom end', () => {
    const { chamberCc: _unused, ...rest } = bottomEnd()
    within(chamberForRatio(rest, 10.0), 42.211, CC_TOLERANCE)
  })

  it("inverts staticCompressionRatio: the chamber that gives a build's ratio is that build's chamber", () => {
    fc.assert(
      fc.property(
        fc.double({ min: 60, max: 110, noNaN: true }),
        fc.double({ min: 60, max: 110, noNaN: true }),
        fc.double({ min: 0.3, max: 2, noNaN: true }),
        fc.double({ min: -0.5, max: 1, noNaN: true }),
        fc.double({ min: -5, max: 15, noNaN: true }),
        fc.double({ min: 20, max: 90, noNaN: true }),
        (bore, stroke, gasket, deck, piston, chamberCc) => {
          const rest = {
            boreMm: bore,
            strokeMm: stroke,
            gasketBoreMm: bore + 1,
            gasketThicknessMm: gasket,
            deckClearanceMm: deck,
            pistonVolumeCc: piston,
          }
          const { ratio } = staticCompressionRatio({ ...rest, chamberCc })
          within(chamberForRatio(rest, ratio), chamberCc, 1e-9)
        },
      ),
    )
  })

  it.each([1, 0.5, Number.NaN])('rejects a target ratio of %f', (target) => {
    const { chamberCc: _unused, ...rest } = bottomEnd()
    expect(() => chamberForRatio(rest, target)).toThrow(RangeError)
  })

  it('refuses a ratio the gasket, deck and dish cannot reach with any chamber', () => {
    const { chamberCc: _unused, ...rest } = bottomEnd({ pistonVolumeCc: 40 })
    expect(() => chamberForRatio(rest, 14)).toThrow(/cannot be reached/)
  })
})

describe('volume helpers (π/4·d²·h, hand-worked)', () => {
  it.each([
    // π/4 · 10² · 10 = 785.398 mm³: catches a radius used where the diameter belongs (4× too big)
    [10, 10, 0.785398],
    // π/4 · 100² · 100 = 785,398 mm³
    [100, 100, 785.398163],
  ])('a %f mm bore by %f mm sweeps %f cc', (bore, height, cc) => {
    within(sweptVolumeCc(bore, height), cc, 1e-6)
    within(cylinderVolumeCc(bore, height), cc, 1e-6)
  })
})
