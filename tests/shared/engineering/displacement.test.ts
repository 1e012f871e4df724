import fc from 'fast-check'
import { unit } from 'mathjs'
import { describe, expect, it } from 'vitest'
import { displacementCc } from '../../../shared/engineering/displacement'
import { ccToIn3, inToMm } from '../../../shared/engineering/units'

const CC_TOLERANCE = 0.001

describe('displacementCc', () => {
  // Formula: Heywood, Internal Combustion Engine Fundamentals, sec. 2.2; 1 in³ = 16.387064 cc exactly,
  // NIST SP 811 (2008), Appendix B.8 [published]. Values hand-worked:
  //   4 · π/4 · 86² · 86 mm³ = 4 · 499,557 mm³ = 1,998.229 cc; / 16.387064 = 121.939 in³
  //   8 · π/4 · 4.000² · 3.480 in³ = 8 · 0.785398 · 16 · 3.48 = 349.848 in³; · 16.387064 = 5,732.978 cc
  it.each([
    ['4 × 86 × 86 mm gives 1998.229 cc = 121.939 in³', 4, 86, 86, 1998.229, 121.939],
    ['8 × 4.000 × 3.480 in gives 5732.978 cc = 349.848 in³', 8, inToMm(4.0), inToMm(3.48), 5732.978, 349.848],
  ])('%s (formula Heywood 2.2, NIST SP 811 B.8 [published]; hand-worked)', (_label, cylinders, bore, stroke, cc, in3) => {
    const result = displacementCc(cylinders, bore, stroke)
    expect(Math.abs(result - cc)).toBeLessThanOrEqual(CC_TOLERANCE)
    expect(Math.abs(ccToIn3(result) - in3)).toBeLessThanOrEqual(CC_TOLERANCE)
    // mathjs as the reference for the cubic-inch figure
    expect(Math.abs(unit(result, 'cm^3').toNumber('in^3') - in3)).toBeLessThanOrEqual(CC_TOLERANCE)
  })

  it('scales with cylinder count and stroke, and with the square of the bore', () => {
    fc.assert(
      fc.property(
        fc.integer({ min: 1, max: 16 }),
        fc.double({ min: 40, max: 140, noNaN: true }),
        fc.double({ min: 40, max: 140, noNaN: true }),
        (n, bore, stroke) => {
          const one = displacementCc(1, bore, stroke)
          expect(displacementCc(n, bore, stroke)).toBeCloseTo(n * one, 9)
          expect(displacementCc(1, bore, 2 * stroke)).toBeCloseTo(2 * one, 9)
          expect(displacementCc(1, 2 * bore, stroke)).toBeCloseTo(4 * one, 9)
        },
      ),
    )
  })

  it.each([
    [0, 86, 86],
    [2.5, 86, 86],
    [4, 0, 86],
    [4, 86, -1],
    [4, Number.NaN, 86],
  ])('rejects cylinders %f, bore %f, stroke %f with a RangeError', (n, bore, stroke) => {
    expect(() => displacementCc(n, bore, stroke)).toThrow(RangeError)
  })
})
