/**
 * Synchronous (toothed) belt geometry for two pulleys, in the terms of ISO 9010: pitch p in mm,
 * pitch length L = z·p. Two belts interchange only if profile, pitch, tooth count, width and
 * construction all match, so these functions work on the pitch line, never outside diameters.
 */
import { requirePositive, requirePositiveInteger } from './guards'

export type PulleyPair = { smallTeeth: number; largeTeeth: number; pitchMm: number }

const CENTRE_TOLERANCE_MM = 1e-9
const MAX_BISECTIONS = 200

/** A four-stroke cam turns once per two crank turns, so its pulley has twice the teeth. */
export function camPulleyTeeth(crankTeeth: number): number {
  return 2 * requirePositiveInteger(crankTeeth, 'crankTeeth')
}

/** d = z·p/π. */
export function pitchDiameterMm(teeth: number, pitchMm: number): number {
  requirePositiveInteger(teeth, 'teeth')
  requirePositive(pitchMm, 'pitchMm')
  return (teeth * pitchMm) / Math.PI
}

function diameters({ smallTeeth, largeTeeth, pitchMm }: PulleyPair): { d: number; D: number } {
  const a = pitchDiameterMm(smallTeeth, pitchMm)
  const b = pitchDiameterMm(largeTeeth, pitchMm)
  // Tolerate the two counts given the wrong way round rather than return a wrong length.
  return { d: Math.min(a, b), D: Math.max(a, b) }
}

/** Below this centre distance the wrap angle formula has no meaning. */
function minCentreMm(d: number, D: number): number {
  return (D - d) / 2
}

function lengthFor(d: number, D: number, centreMm: number): number {
  const phi = Math.asin((D - d) / (2 * centreMm))
  return 2 * centreMm * Math.cos(phi) + (Math.PI * (D + d)) / 2 + phi * (D - d)
}

/** L = 2C·cosφ + π(D+d)/2 + φ(D−d), φ = asin((D−d)/2C). */
export function openBeltLengthMm(input: PulleyPair & { centreMm: number }): number {
  const { d, D } = diameters(input)
  requirePositive(input.centreMm, 'centreMm')
  if (input.centreMm <= minCentreMm(d, D)) {
    throw new RangeError(`centreMm must exceed ${minCentreMm(d, D).toFixed(3)} mm for these pulleys`)
  }
  return lengthFor(d, D, input.centreMm)
}

/** Exact (fractional) tooth count for a centre distance; a real belt has the nearest whole count. */
export function beltTeethForCentre(input: PulleyPair & { centreMm: number }): number {
  return openBeltLengthMm(input) / input.pitchMm
}

/**
 * Centre distance a belt of `beltTeeth` sets. L grows monotonically with C (dL/dC = 2cosφ > 0),
 * so bisection between the geometric minimum and L/2 always converges.
 */
export function centreDistanceForBeltMm(input: PulleyPair & { beltTeeth: number }): number {
  const { d, D } = diameters(input)
  requirePositive(input.beltTeeth, 'beltTeeth')
  const targetMm = input.beltTeeth * input.pitchMm
  // The length formula bottoms out at πD (at the minimum centre), so shorter belts have no solution.
  if (targetMm <= Math.PI * D) {
    throw new RangeError(`A ${input.beltTeeth}-tooth belt is too short to pass round these pulleys`)
  }
  let low = minCentreMm(d, D)
  let high = targetMm / 2
  for (let i = 0; i < MAX_BISECTIONS && high - low > CENTRE_TOLERANCE_MM; i++) {
    const mid = (low + high) / 2
    if (lengthFor(d, D, mid) < targetMm) low = mid
    else high = mid
  }
  return (low + high) / 2
}
