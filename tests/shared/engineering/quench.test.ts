import { unit } from 'mathjs'
import { describe, expect, it } from 'vitest'
import { checkQuench, quenchMm, TYPICAL_QUENCH_MM } from '../../../shared/engineering/quench'

// Quench = deck clearance + compressed gasket: geometry, hand-worked. The band is common practice
// (the trade's 0.035–0.045 in, rounded to 0.9–1.15 mm); no published source.
const inch = (inches: number): number => unit(inches, 'inch').toNumber('mm')

function within(actual: number, expected: number, tolerance = 1e-9): void {
  expect(Math.abs(actual - expected)).toBeLessThanOrEqual(tolerance)
}

describe('quenchMm (geometry, hand-worked)', () => {
  it.each([
    // 0.2 + 1.2 = 1.4 mm (the 86 × 86 mm bottom end of the compression tests)
    ['piston 0.2 mm below deck, 1.2 mm gasket', 0.2, 1.2, 1.4],
    // a proud piston takes its height off the gasket: −0.1 + 1.0 = 0.9 mm
    ['piston 0.1 mm proud, 1.0 mm gasket', -0.1, 1.0, 0.9],
    // inch shop figures through mathjs: 0.005 + 0.039 = 0.044 in = 0.044 · 25.4 = 1.1176 mm
    ['0.005 in below deck, 0.039 in gasket', inch(0.005), inch(0.039), 1.1176],
  ])('%s gives %f mm', (_label, deck, gasket, expected) => {
    within(quenchMm(deck, gasket), expected)
  })

  it('rejects a negative gasket thickness and a NaN deck, naming the field', () => {
    expect(() => quenchMm(0.2, -1)).toThrow(/compressedGasketMm/)
    expect(() => quenchMm(Number.NaN, 1)).toThrow(/deckClearanceMm/)
  })
})

describe('checkQuench against the usual band (common practice)', () => {
  it('uses 0.9–1.15 mm unless told otherwise', () => {
    // 0.035 in = 0.889 mm and 0.045 in = 1.143 mm, rounded outward to the nearest 0.05 mm
    within(TYPICAL_QUENCH_MM.min, 0.9, 0.02)
    within(inch(0.035), TYPICAL_QUENCH_MM.min, 0.02)
    within(inch(0.045), TYPICAL_QUENCH_MM.max, 0.01)
  })

  it.each([
    ['0.2 mm down, 0.8 mm gasket: 1.0 mm', 0.2, 0.8, 1.0, 'ok'],
    ['on the lower limit: 0.1 mm proud, 1.0 mm gasket = 0.9 mm', -0.1, 1.0, 0.9, 'ok'],
    ['on the upper limit: 0.35 mm down, 0.8 mm gasket = 1.15 mm', 0.35, 0.8, 1.15, 'ok'],
    ['the 86 × 86 mm build: 1.4 mm loses squish', 0.2, 1.2, 1.4, 'wide'],
    ['0.025 in down, 0.041 in gasket = 0.066 in = 1.676 mm', inch(0.025), inch(0.041), 1.6764, 'wide'],
    ['0.3 mm proud on a 0.7 mm gasket: 0.4 mm is too tight', -0.3, 0.7, 0.4, 'tight'],
    ['1.0 mm proud on a 0.7 mm gasket: the piston meets the head', -1.0, 0.7, -0.3, 'contact'],
    ['flush piston, no gasket: zero gap is contact', 0, 0, 0, 'contact'],
  ] as const)('%s → %s', (_label, deckClearanceMm, compressedGasketMm, expectedMm, status) => {
    const check = checkQuench({ deckClearanceMm, compressedGasketMm })
    within(check.quenchMm, expectedMm, 1e-6)
    expect(check.status).toBe(status)
    expect(check.band).toEqual({ min: 0.9, max: 1.15 })
  })

  it('judges against a band the piston maker gives instead', () => {
    const band = { min: 1.2, max: 1.5 }
    expect(checkQuench({ deckClearanceMm: 0.2, compressedGasketMm: 1.2, band })).toMatchObject({ status: 'ok', band })
    expect(checkQuench({ deckClearanceMm: 0.2, compressedGasketMm: 0.8, band }).status).toBe('tight')
  })

  it('rejects a band whose maximum is below its minimum', () => {
    expect(() => checkQuench({ deckClearanceMm: 0.2, compressedGasketMm: 1, band: { min: 1.2, max: 1.0 } })).toThrow(RangeError)
  })
})
