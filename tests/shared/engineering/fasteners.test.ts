import fc from 'fast-check'
import { describe, expect, it } from 'vitest'
import {
  checkHeadBolt,
  type HeadBoltInput,
  minThreadEngagementMm,
  preloadForTorqueN,
  spacerFix,
  type ThreadMaterial,
  tighteningTorqueNm,
  torqueForNewLubricant,
} from '../../../shared/engineering/fasteners'
import { inToMm, lbfToN, nmToLbfFt } from '../../../shared/engineering/units'

// T = K·D·F: Shigley's Mechanical Engineering Design, 10th ed., sec. 8-8 [published]; the nut factors
// (0.30 plain, 0.20 zinc, 0.18 lubricated) are its torque-factor table (table number from memory).
// Blind-hole fit and engagement are common practice. Values hand-worked beside each check.
const SHIGLEY = "Shigley's Mechanical Engineering Design, 10th ed., sec. 8-8 [published]"
const MATERIALS: ThreadMaterial[] = ['steel', 'cast-iron', 'aluminium']

function within(actual: number, expected: number, tolerance: number): void {
  expect(Math.abs(actual - expected)).toBeLessThanOrEqual(tolerance)
}

// M10×1.5 into aluminium, 110 mm bolt, grip 68 + 1.0 + 2.0 mm, 35 mm tapped depth
function m10IntoAluminium(change: Partial<HeadBoltInput> = {}): HeadBoltInput {
  return {
    boltLengthMm: 110,
    diameterMm: 10,
    pitchMm: 1.5,
    bossHeightMm: 68,
    gasketThicknessMm: 1.0,
    washerThicknessMm: 2.0,
    tappedDepthMm: 35,
    material: 'aluminium',
    ...change,
  }
}

describe(`torque–tension T = K·D·F (${SHIGLEY})`, () => {
  // 0.20 · 0.5 in · 12,000 lbf = 1,200 lbf·in = 100 lbf·ft; · 1.355818 = 135.582 N·m
  it('K 0.20, D 0.5 in, F 12,000 lbf gives 100 lbf·ft = 135.582 N·m', () => {
    const torqueNm = tighteningTorqueNm({ nutFactor: 0.2, diameterMm: inToMm(0.5), preloadN: lbfToN(12_000) })
    within(torqueNm, 135.582, 0.001)
    within(nmToLbfFt(torqueNm), 100, 0.001)
  })

  // 0.20 · 0.010 m · 30,000 N = 60 N·m
  it('K 0.20, M10, 30 kN gives 60.0 N·m', () => {
    within(tighteningTorqueNm({ nutFactor: 0.2, diameterMm: 10, preloadN: 30_000 }), 60.0, 0.05)
  })

  // 80 N·m / (0.15 · 0.012 m) = 80 / 0.0018 = 44,444 N
  it('80 N·m, K 0.15, M12 gives 44.44 kN', () => {
    within(preloadForTorqueN({ torqueNm: 80, nutFactor: 0.15, diameterMm: 12 }) / 1000, 44.44, 0.005)
  })

  it('preloadForTorqueN inverts tighteningTorqueNm', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 0.1, max: 0.35, noNaN: true }),
        fc.double({ min: 5, max: 24, noNaN: true }),
        fc.double({ min: 1000, max: 200_000, noNaN: true }),
        (nutFactor, diameterMm, preloadN) => {
          const torqueNm = tighteningTorqueNm({ nutFactor, diameterMm, preloadN })
          within(preloadForTorqueN({ torqueNm, nutFactor, diameterMm }), preloadN, 1e-9 * preloadN)
        },
      ),
    )
  })

  it('torqueForNewLubricant keeps the same preload under the new nut factor', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 10, max: 300, noNaN: true }),
        fc.double({ min: 0.1, max: 0.35, noNaN: true }),
        fc.double({ min: 0.1, max: 0.35, noNaN: true }),
        (torque, kOld, kNew) => {
          const before = preloadForTorqueN({ torqueNm: torque, nutFactor: kOld, diameterMm: 10 })
          const after = preloadForTorqueN({ torqueNm: torqueForNewLubricant(torque, kOld, kNew), nutFactor: kNew, diameterMm: 10 })
          within(after, before, 1e-9 * before)
        },
      ),
    )
  })

  // 60 N·m · 0.18 / 0.20 = 54 N·m: a lubricated thread needs less torque for the same preload
  it('60 N·m on a zinc thread (K 0.20) becomes 54 N·m lubricated (K 0.18)', () => {
    within(torqueForNewLubricant(60, 0.2, 0.18), 54, 1e-9)
  })

  it.each([
    ['nutFactor', { nutFactor: 0, diameterMm: 10, preloadN: 30_000 }],
    ['diameterMm', { nutFactor: 0.2, diameterMm: -10, preloadN: 30_000 }],
    ['preloadN', { nutFactor: 0.2, diameterMm: 10, preloadN: Number.NaN }],
  ])('rejects a bad %s', (name, input) => {
    expect(() => tighteningTorqueNm(input)).toThrow(name)
  })
})

describe('minimum thread engagement (common practice)', () => {
  it.each([
    ['steel', 1.0, 10],
    ['cast-iron', 1.5, 15],
    ['aluminium', 2.0, 20],
  ] as const)('%s: %f × D, so an M10 needs %f mm', (material, _factor, expectedMm) => {
    within(minThreadEngagementMm(10, material), expectedMm, 1e-9)
  })
})

describe('checkHeadBolt in a blind hole (common practice)', () => {
  // grip 68 + 1.0 + 2.0 = 71; projection 110 − 71 = 39; engagement 2.0 · 10 = 20; deepest 35 − 2 · 1.5 = 32;
  // 39 > 32 bottoms by 7 mm; lengths 71 + 20 = 91 to 71 + 32 = 103 mm fit (common practice)
  it('M10×1.5 into aluminium, 110 mm bolt, 71 mm grip: projection 39 > 32 mm, bottoms; 91–103 mm fit', () => {
    const check = checkHeadBolt(m10IntoAluminium())
    within(check.gripMm, 71, 1e-9)
    within(check.projectionMm, 39, 1e-9)
    within(check.minEngagementMm, 20, 1e-9)
    within(check.maxProjectionMm, 32, 1e-9)
    expect(check.status).toBe('bottoms')
    within(check.lengthRangeMm.min, 91, 1e-9)
    within(check.lengthRangeMm.max, 103, 1e-9)
    within(check.extraGripNeededMm, 7, 1e-9)
  })

  it.each([
    [85, 'too-short'],
    [91, 'ok'],
    [100, 'ok'],
    [103, 'ok'],
    [104, 'bottoms'],
  ] as const)('a %f mm bolt in the same hole is %s', (boltLengthMm, status) => {
    const check = checkHeadBolt(m10IntoAluminium({ boltLengthMm }))
    expect(check.status).toBe(status)
    expect(check.extraGripNeededMm > 0).toBe(status === 'bottoms')
  })

  // 35 − 1 · 1.5 = 33.5 mm
  it('honours a different clearance allowance', () => {
    within(checkHeadBolt(m10IntoAluminium({ clearancePitches: 1 })).maxProjectionMm, 33.5, 1e-9)
  })

  const boltGeometry = fc.record({
    diameterMm: fc.constantFrom(6, 8, 10, 11, 12, 14),
    pitchMm: fc.constantFrom(1, 1.25, 1.5, 1.75),
    bossHeightMm: fc.double({ min: 5, max: 120, noNaN: true }),
    gasketThicknessMm: fc.double({ min: 0, max: 2, noNaN: true }),
    washerThicknessMm: fc.double({ min: 0, max: 5, noNaN: true }),
    tappedDepthMm: fc.double({ min: 15, max: 60, noNaN: true }),
    material: fc.constantFrom(...MATERIALS),
  })

  it('every length in lengthRange, ends included, is ok; just outside is not', () => {
    fc.assert(
      fc.property(boltGeometry, fc.double({ min: 0, max: 1, noNaN: true }), (geometry, t) => {
        const range = checkHeadBolt({ ...geometry, boltLengthMm: 200 }).lengthRangeMm
        fc.pre(range.min <= range.max)
        for (const boltLengthMm of [range.min, range.max, range.min + t * (range.max - range.min)]) {
          expect(checkHeadBolt({ ...geometry, boltLengthMm }).status).toBe('ok')
        }
        expect(checkHeadBolt({ ...geometry, boltLengthMm: range.max + 0.01 }).status).toBe('bottoms')
        expect(checkHeadBolt({ ...geometry, boltLengthMm: range.min - 0.01 }).status).toBe('too-short')
      }),
    )
  })

  it.each([
    ['boltLengthMm', { boltLengthMm: 0 }],
    ['pitchMm', { pitchMm: -1.5 }],
    ['tappedDepthMm', { tappedDepthMm: Number.NaN }],
    ['washerThicknessMm', { washerThicknessMm: -1 }],
  ])('rejects a bad %s', (name, change) => {
    expect(() => checkHeadBolt(m10IntoAluminium(change))).toThrow(name)
  })
})

describe('spacerFix (common practice; ordinary bolts only)', () => {
  it('a 7 mm spacer is the thinnest option that stops the 110 mm bolt bottoming (P = 32 ≥ 20)', () => {
    const fix = spacerFix(m10IntoAluminium(), [10, 2, 7, 5, 8])
    expect(fix?.spacerMm).toBe(7)
    expect(fix?.check.status).toBe('ok')
    within(fix?.check.projectionMm ?? Number.NaN, 32, 1e-9)
  })

  it('returns null when no option is thick enough', () => {
    expect(spacerFix(m10IntoAluminium(), [1, 2, 5])).toBeNull()
  })

  it('returns null when the thinnest fitting spacer would leave too little thread engaged', () => {
    // 132 mm bolt: needs 29 mm extra grip, which leaves 32 mm projection; 50 mm leaves only 11.
    expect(spacerFix(m10IntoAluminium({ boltLengthMm: 132 }), [50])).toBeNull()
  })

  it.each([[100], [85]])('returns null for a %f mm bolt that does not bottom', (boltLengthMm) => {
    expect(spacerFix(m10IntoAluminium({ boltLengthMm }), [1, 2, 5, 7, 10])).toBeNull()
  })

  it("does not reorder the caller's options", () => {
    const options = [10, 2, 7]
    spacerFix(m10IntoAluminium(), options)
    expect(options).toEqual([10, 2, 7])
  })

  it('picks an ok stack and no thinner option would do', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 104, max: 130, noNaN: true }),
        fc.uniqueArray(fc.integer({ min: 1, max: 40 }), { minLength: 1, maxLength: 8 }),
        (boltLengthMm, options) => {
          const input = m10IntoAluminium({ boltLengthMm })
          const fix = spacerFix(input, options)
          const okOptions = options.filter(
            (mm) => checkHeadBolt({ ...input, washerThicknessMm: input.washerThicknessMm + mm }).status === 'ok',
          )
          if (okOptions.length === 0) expect(fix).toBeNull()
          else expect(fix?.spacerMm).toBe(Math.min(...okOptions))
        },
      ),
    )
  })
})
