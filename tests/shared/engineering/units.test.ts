import fc from 'fast-check'
import { unit } from 'mathjs'
import { describe, expect, it } from 'vitest'
import {
  barToPsi,
  CC_PER_IN3,
  ccToIn3,
  hpToKw,
  in3ToCc,
  inToMm,
  KG_PER_LB,
  KPA_PER_BAR,
  KPA_PER_PSI,
  kwToHp,
  lbfFtToNm,
  MM_PER_IN,
  mmToIn,
  N_PER_LBF,
  NM_PER_LBFFT,
  nmToLbfFt,
  psiToBar,
  W_PER_HP,
  lbfToN,
  microinchToUm,
  nToLbf,
  umToMicroinch,
} from '../../../shared/engineering/units'

const EXACT = 1e-12
// The trade rounds these factors to 7 significant figures; half a unit in the last place is ~1e-7 relative.
const ROUNDED = 1e-7

function expectRelativelyClose(actual: number, expected: number, relTol: number): void {
  expect(Math.abs(actual - expected)).toBeLessThanOrEqual(relTol * Math.abs(expected))
}

// NIST SP 811 (2008), Appendix B.8 [published]; reference values from mathjs.
describe('conversion constants against mathjs as reference', () => {
  it.each([
    ['MM_PER_IN (exact)', MM_PER_IN, unit(1, 'in').toNumber('mm'), EXACT],
    ['CC_PER_IN3 (exact)', CC_PER_IN3, unit(1, 'in^3').toNumber('cm^3'), EXACT],
    ['KG_PER_LB (exact)', KG_PER_LB, unit(1, 'lbm').toNumber('kg'), EXACT],
    ['N_PER_LBF (exact)', N_PER_LBF, unit(1, 'lbf').toNumber('N'), EXACT],
    ['KPA_PER_BAR (exact)', KPA_PER_BAR, unit(1, 'bar').toNumber('kPa'), EXACT],
    ['W_PER_HP (rounded)', W_PER_HP, unit(1, 'hp').toNumber('W'), ROUNDED],
    ['NM_PER_LBFFT (rounded)', NM_PER_LBFFT, unit('1 lbf ft').toNumber('N m'), ROUNDED],
    ['KPA_PER_PSI (rounded)', KPA_PER_PSI, unit(1, 'psi').toNumber('kPa'), ROUNDED],
  ])('%s matches mathjs', (_name, constant, reference, tolerance) => {
    expectRelativelyClose(constant, reference, tolerance)
  })
})

// Each factor rebuilt by hand from the defining figures, not from the constants it checks:
// 1 in = 25.4 mm and 1 lb = 0.45359237 kg exactly (international yard and pound, 1959), standard
// gravity 9.80665 m/s² (CGPM 1901), 1 ft = 0.3048 m, 1 hp = 550 ft·lbf/s; the rounded trade factors
// match NIST SP 811 (2008), Appendix B.8 [published] to the printed digits.
const STANDARD_GRAVITY = 9.80665
const LBF_N = 0.45359237 * STANDARD_GRAVITY // 4.448 221 615 260 5 N
describe('conversion constants rebuilt from their definitions', () => {
  it.each([
    ['CC_PER_IN3 = 2.54³', CC_PER_IN3, 2.54 ** 3, EXACT],
    ['N_PER_LBF = 0.45359237 kg · 9.80665 m/s²', N_PER_LBF, LBF_N, EXACT],
    ['NM_PER_LBFFT = 1 lbf · 0.3048 m = 1.355 818 (NIST B.8)', NM_PER_LBFFT, LBF_N * 0.3048, ROUNDED],
    ['W_PER_HP = 550 ft·lbf/s = 745.699 9 W (NIST B.8)', W_PER_HP, 550 * 0.3048 * LBF_N, ROUNDED],
    ['KPA_PER_PSI = 1 lbf / (0.0254 m)² = 6.894 757 kPa (NIST B.8)', KPA_PER_PSI, LBF_N / 0.0254 ** 2 / 1000, ROUNDED],
    ['KPA_PER_BAR = 10⁵ Pa', KPA_PER_BAR, 1e5 / 1000, EXACT],
  ])('%s', (_name, constant, definition, tolerance) => {
    expectRelativelyClose(constant, definition, tolerance)
  })

  it('a US gallon of 231 in³ is 3.785411784 L (NIST B.8), tying CC_PER_IN3 to the exact inch', () => {
    expect(231 * CC_PER_IN3).toBeCloseTo(3785.411784, 9)
    expect(MM_PER_IN ** 3 / 1000).toBeCloseTo(CC_PER_IN3, 12)
  })
})

describe('conversion functions against mathjs as reference', () => {
  const cases: Array<[string, (x: number) => number, string, string, number]> = [
    ['inToMm', inToMm, 'in', 'mm', EXACT],
    ['mmToIn', mmToIn, 'mm', 'in', EXACT],
    ['in3ToCc', in3ToCc, 'in^3', 'cm^3', EXACT],
    ['ccToIn3', ccToIn3, 'cm^3', 'in^3', EXACT],
    ['hpToKw', hpToKw, 'hp', 'kW', ROUNDED],
    ['kwToHp', kwToHp, 'kW', 'hp', ROUNDED],
    ['lbfFtToNm', lbfFtToNm, 'lbf ft', 'N m', ROUNDED],
    ['nmToLbfFt', nmToLbfFt, 'N m', 'lbf ft', ROUNDED],
    ['psiToBar', psiToBar, 'psi', 'bar', ROUNDED],
    ['barToPsi', barToPsi, 'bar', 'psi', ROUNDED],
    ['microinchToUm', (x: number) => microinchToUm(x * 1e6), 'inch', 'micrometer', EXACT],
    ['umToMicroinch', (x: number) => umToMicroinch(x) / 1e6, 'micrometer', 'inch', EXACT],
    ['lbfToN', lbfToN, 'lbf', 'N', EXACT],
    ['nToLbf', nToLbf, 'N', 'lbf', EXACT],
  ]

  it.each(cases)('%s agrees with mathjs for any magnitude a workshop meets', (_name, convert, from, to, tolerance) => {
    fc.assert(
      fc.property(fc.double({ min: 1e-3, max: 1e5, noNaN: true }), (x) => {
        expectRelativelyClose(convert(x), unit(`${x} ${from}`).toNumber(to), tolerance)
      }),
    )
  })

  it.each([
    ['mm/in', inToMm, mmToIn],
    ['cc/in³', in3ToCc, ccToIn3],
    ['kW/hp', hpToKw, kwToHp],
    ['N·m/lbf·ft', lbfFtToNm, nmToLbfFt],
    ['bar/psi', psiToBar, barToPsi],
  ])('%s conversions round-trip', (_name, forward, back) => {
    fc.assert(
      fc.property(fc.double({ min: -1e6, max: 1e6, noNaN: true }), (x) => {
        expect(back(forward(x))).toBeCloseTo(x, 6)
      }),
    )
  })
})
