import { describe, expect, it } from 'vitest'
import { checkInjectorCalibration, type InjectorCalibrationInput } from '../../../shared/engineering/injector-calibration'

// Fuel delivered scales with fitted flow over calibrated flow at the same pulse (definition of flow);
// the pressure correction is the orifice law Q ∝ √ΔP [published in any fluid-mechanics text]. The
// ±10 % band is common practice (from memory). Values hand-worked beside each check.
function calibration(change: Partial<InjectorCalibrationInput> = {}): InjectorCalibrationInput {
  return { fittedFlowCcMin: 440, fittedRatedPressureBar: 3, calibratedFlowCcMin: 380, calibratedPressureBar: 3, ...change }
}

function within(actual: number, expected: number, tolerance: number): void {
  expect(Math.abs(actual - expected)).toBeLessThanOrEqual(tolerance)
}

describe('checkInjectorCalibration (band check, common practice)', () => {
  // 440 / 380 = 1.15789: 15.79 % more fuel than calibrated
  it('440 cc/min injectors on a unit calibrated for 380 cc/min run 15.79 % rich, worst at idle', () => {
    const check = checkInjectorCalibration(calibration())
    within(check.mismatchPct, 15.79, 0.005)
    expect(check.status).toBe('rich')
    expect(check.reason).toMatch(/rich, worst at idle/)
  })

  // 330 / 380 = 0.86842: 13.16 % short
  it('330 cc/min injectors on the same unit run 13.16 % lean, worst at full load', () => {
    const check = checkInjectorCalibration(calibration({ fittedFlowCcMin: 330 }))
    within(check.mismatchPct, -13.16, 0.005)
    expect(check.status).toBe('lean')
    expect(check.reason).toMatch(/lean, worst at full load/)
  })

  // 440 · √(4/3) = 508.07 cc/min at 4 bar: +0.01 % against a 508 cc/min calibration
  it('restates the fitted flow at the calibration pressure: 440 cc/min at 3 bar is 508.07 at 4 bar, a match for 508', () => {
    const check = checkInjectorCalibration(calibration({ calibratedFlowCcMin: 508, calibratedPressureBar: 4 }))
    within(check.fittedAtCalibrationPressureCcMin, 508.07, 0.005)
    within(check.mismatchPct, 0.013, 0.001)
    expect(check.status).toBe('ok')
  })

  // Same 440 cc/min label, but rated at 3 bar against a calibration of 440 cc/min at 4 bar:
  // 508.07 / 440 = 1.1547, 15.47 % rich. Reading the labels alone would call it a match.
  it('does not call equal labels a match when they are rated at different pressures', () => {
    const check = checkInjectorCalibration(calibration({ calibratedFlowCcMin: 440, calibratedPressureBar: 4 }))
    within(check.mismatchPct, 15.47, 0.005)
    expect(check.status).toBe('rich')
  })

  // 418 / 380 = 1.100 and 342 / 380 = 0.900: on the edges of the ±10 % band
  it.each([
    [418, 'ok'],
    [419, 'rich'],
    [342, 'ok'],
    [341, 'lean'],
  ] as const)('%f cc/min against 380 is %s', (fittedFlowCcMin, status) => {
    expect(checkInjectorCalibration(calibration({ fittedFlowCcMin })).status).toBe(status)
  })

  // 400 / 380 = 1.0526: inside ±10 %, outside ±5 %
  it('judges against a tighter band when given one', () => {
    expect(checkInjectorCalibration(calibration({ fittedFlowCcMin: 400 })).status).toBe('ok')
    expect(checkInjectorCalibration(calibration({ fittedFlowCcMin: 400, tolerancePct: 5 })).status).toBe('rich')
  })

  it.each([
    ['fittedFlowCcMin', { fittedFlowCcMin: 0 }],
    ['calibratedFlowCcMin', { calibratedFlowCcMin: Number.NaN }],
    ['calibratedPressureBar', { calibratedPressureBar: -3 }],
    ['tolerancePct', { tolerancePct: 0 }],
  ])('rejects a bad %s with a RangeError naming it', (name, change) => {
    expect(() => checkInjectorCalibration(calibration(change))).toThrow(name)
  })
})
