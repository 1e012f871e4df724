/**
 * Injector sizing. The sizing formula is common practice; the pressure correction is the
 * orifice law (flow ∝ √ΔP) found in any fluid-mechanics text; test terms follow SAE J1832.
 * Pressures are differential: rail minus manifold.
 */
import { requireNonNegative, requirePositive, requirePositiveInteger } from './guards'
import { KG_PER_LB, hpToKw, kwToHp } from './units'

/** The usual assumption for a naturally aspirated petrol engine [common practice]; pass a measured figure when there is one. */
export const DEFAULT_BSFC_LB_PER_HP_H = 0.5
/** Headroom so the injector never runs static at full load [common practice]. */
export const DEFAULT_MAX_DUTY = 0.8
/**
 * The density behind the trade's "lb/h × 10.5 = cc/min" shortcut [common practice]; pump petrol runs
 * about 0.72–0.775 g/cm³ at 15 °C (from memory), so pass the fuel's own figure when it is known.
 */
export const GASOLINE_DENSITY_G_PER_CC = 0.72

const G_PER_LB = KG_PER_LB * 1000
const MIN_PER_H = 60

/** Metric BSFC for screens that show g/kWh. */
export function bsfcToGPerKwh(lbPerHpH: number): number {
  return (lbPerHpH * G_PER_LB) / hpToKw(1)
}

export type FlowNeededInput = { powerHp: number; bsfc?: number; injectors: number; maxDuty?: number }

/** Static flow each injector needs, in lb/h. */
export function injectorFlowNeededLbH({
  powerHp,
  bsfc = DEFAULT_BSFC_LB_PER_HP_H,
  injectors,
  maxDuty = DEFAULT_MAX_DUTY,
}: FlowNeededInput): number {
  requireNonNegative(powerHp, 'powerHp')
  requirePositive(bsfc, 'bsfc')
  requirePositiveInteger(injectors, 'injectors')
  requireDuty(maxDuty)
  return (powerHp * bsfc) / (injectors * maxDuty)
}

export function lbPerHourToCcPerMin(lbh: number, densityGPerCc = GASOLINE_DENSITY_G_PER_CC): number {
  requirePositive(densityGPerCc, 'densityGPerCc')
  return (lbh * G_PER_LB) / (MIN_PER_H * densityGPerCc)
}

export function ccPerMinToLbPerHour(ccMin: number, densityGPerCc = GASOLINE_DENSITY_G_PER_CC): number {
  requirePositive(densityGPerCc, 'densityGPerCc')
  return (ccMin * MIN_PER_H * densityGPerCc) / G_PER_LB
}

/** Q2 = Q1·√(ΔP2/ΔP1); flow and pressures in any consistent units. */
export function flowAtPressure(flow: number, ratedDeltaP: number, newDeltaP: number): number {
  requireNonNegative(flow, 'flow')
  requirePositive(ratedDeltaP, 'ratedDeltaP')
  requireNonNegative(newDeltaP, 'newDeltaP')
  return flow * Math.sqrt(newDeltaP / ratedDeltaP)
}

export type SupportedPowerInput = { flowLbH: number; injectors: number; bsfc?: number; maxDuty?: number }

/** Inverse of the sizing formula: the power a set of injectors can feed. */
export function supportedPowerHp({
  flowLbH,
  injectors,
  bsfc = DEFAULT_BSFC_LB_PER_HP_H,
  maxDuty = DEFAULT_MAX_DUTY,
}: SupportedPowerInput): number {
  requireNonNegative(flowLbH, 'flowLbH')
  requirePositiveInteger(injectors, 'injectors')
  requirePositive(bsfc, 'bsfc')
  requireDuty(maxDuty)
  return (flowLbH * injectors * maxDuty) / bsfc
}

export type HeadroomInput = {
  targetPowerKw: number
  injectors: number
  /** Rated flow per injector at `ratedPressureBar`. */
  flowCcMin: number
  ratedPressureBar: number
  /** Differential pressure the injector will see; subtract boost for a rail not referenced to the manifold. */
  railPressureBar: number
  bsfc?: number
  maxDuty?: number
  densityGPerCc?: number
}

export type Headroom = { neededCcMin: number; availableCcMin: number; headroomPct: number }

/** Negative headroom means the injectors are too small for the target power. */
export function injectorHeadroom(input: HeadroomInput): Headroom {
  requirePositive(input.targetPowerKw, 'targetPowerKw')
  const neededLbH = injectorFlowNeededLbH({
    powerHp: kwToHp(input.targetPowerKw),
    injectors: input.injectors,
    bsfc: input.bsfc,
    maxDuty: input.maxDuty,
  })
  const neededCcMin = lbPerHourToCcPerMin(neededLbH, input.densityGPerCc)
  const availableCcMin = flowAtPressure(input.flowCcMin, input.ratedPressureBar, input.railPressureBar)
  return { neededCcMin, availableCcMin, headroomPct: (availableCcMin / neededCcMin - 1) * 100 }
}

function requireDuty(maxDuty: number): void {
  if (!Number.isFinite(maxDuty) || maxDuty <= 0 || maxDuty > 1) {
    throw new RangeError(`maxDuty must be in (0, 1], got ${maxDuty}`)
  }
}
