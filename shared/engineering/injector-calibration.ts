/**
 * Injector flow against the control unit's calibration. The control unit times each pulse for the
 * injector flow it was calibrated for, so a different injector delivers fuel in proportion to its
 * flow over the calibrated one: larger runs rich (worst at idle, where the shortest pulse and the
 * fuel trims run out first), smaller runs lean (worst at full load, where lean means detonation).
 * Both flows are compared at the same differential pressure with the orifice law (flow ∝ √ΔP);
 * the rail pressure then cancels out of the ratio, so only the two rating pressures matter.
 */
import { requirePositive } from './guards'
import { flowAtPressure } from './injectors'

/**
 * Common practice, no published source: a mismatch of about a tenth is what closed-loop fuel trims
 * absorb while leaving room for wear and altitude (from memory). Beyond it, rescale the control
 * unit's injector data or fit the size it was calibrated for.
 */
export const DEFAULT_CALIBRATION_TOLERANCE_PCT = 10

export type InjectorCalibrationInput = {
  /** Rated flow of the injectors fitted, at `fittedRatedPressureBar`. */
  fittedFlowCcMin: number
  fittedRatedPressureBar: number
  /** Injector flow the control unit's calibration assumes, at `calibratedPressureBar`. */
  calibratedFlowCcMin: number
  calibratedPressureBar: number
  tolerancePct?: number
}

export type CalibrationStatus = 'ok' | 'rich' | 'lean'

export type InjectorCalibrationCheck = {
  /** The fitted injector's flow restated at the calibration's pressure. */
  fittedAtCalibrationPressureCcMin: number
  /** Positive: more fuel than the calibration expects. */
  mismatchPct: number
  tolerancePct: number
  status: CalibrationStatus
  reason: string
}

const LIMIT_EPSILON_PCT = 1e-9

export function checkInjectorCalibration(input: InjectorCalibrationInput): InjectorCalibrationCheck {
  requirePositive(input.fittedFlowCcMin, 'fittedFlowCcMin')
  requirePositive(input.fittedRatedPressureBar, 'fittedRatedPressureBar')
  requirePositive(input.calibratedFlowCcMin, 'calibratedFlowCcMin')
  requirePositive(input.calibratedPressureBar, 'calibratedPressureBar')
  const tolerancePct = requirePositive(input.tolerancePct ?? DEFAULT_CALIBRATION_TOLERANCE_PCT, 'tolerancePct')

  const fittedAtCalibrationPressureCcMin = flowAtPressure(input.fittedFlowCcMin, input.fittedRatedPressureBar, input.calibratedPressureBar)
  const mismatchPct = (fittedAtCalibrationPressureCcMin / input.calibratedFlowCcMin - 1) * 100
  const shown = `${Math.abs(mismatchPct).toFixed(1)} %`

  let status: CalibrationStatus = 'ok'
  let reason = `Within ${tolerancePct} % of the control unit's calibration (${mismatchPct >= 0 ? '+' : '−'}${shown}): the fuel trims take it up`
  if (mismatchPct > tolerancePct + LIMIT_EPSILON_PCT) {
    status = 'rich'
    reason = `Injectors flow ${shown} more than the control unit is calibrated for: it runs rich, worst at idle. Rescale the injector data or fit the calibrated size`
  } else if (mismatchPct < -tolerancePct - LIMIT_EPSILON_PCT) {
    status = 'lean'
    reason = `Injectors flow ${shown} less than the control unit is calibrated for: it runs lean, worst at full load, where lean risks detonation. Rescale the injector data or fit the calibrated size`
  }
  return { fittedAtCalibrationPressureCcMin, mismatchPct, tolerancePct, status, reason }
}
