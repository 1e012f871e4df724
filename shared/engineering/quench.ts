/**
 * Quench (squish): the gap between the piston crown and the head's flat squish area at top dead
 * centre. It is the deck clearance (piston below deck positive, proud negative) plus the gasket's
 * COMPRESSED thickness, because that is what the head sits on once torqued. Lengths in mm.
 */
import { requireFinite, requireNonNegative, requirePositive } from './guards'

export type QuenchBand = { min: number; max: number }

/**
 * Common practice, no single published source: the trade quotes 0.035–0.045 in for steel rods,
 * rounded here to 0.9–1.15 mm. Tighter risks the piston touching the head at speed (rod stretch,
 * piston rock); wider loses the squish that fights knock. Aluminium rods and long strokes want
 * more (from memory). The piston or rod maker's figure governs when it gives one.
 */
export const TYPICAL_QUENCH_MM: Readonly<QuenchBand> = { min: 0.9, max: 1.15 }

/** Piston-to-head gap at TDC: deck clearance plus compressed gasket thickness. */
export function quenchMm(deckClearanceMm: number, compressedGasketMm: number): number {
  requireFinite(deckClearanceMm, 'deckClearanceMm')
  requireNonNegative(compressedGasketMm, 'compressedGasketMm')
  return deckClearanceMm + compressedGasketMm
}

/** 'contact' means the figures put the piston into the head: never run it, measure it. */
export type QuenchStatus = 'contact' | 'tight' | 'ok' | 'wide'

export type QuenchCheck = { quenchMm: number; band: QuenchBand; status: QuenchStatus }

export type QuenchInput = {
  deckClearanceMm: number
  compressedGasketMm: number
  band?: QuenchBand
}

/** Far below any feeler-gauge reading; keeps float sums from flipping a gap that sits on a limit. */
const LIMIT_EPSILON_MM = 1e-9

export function checkQuench({ deckClearanceMm, compressedGasketMm, band = TYPICAL_QUENCH_MM }: QuenchInput): QuenchCheck {
  requirePositive(band.min, 'band.min')
  requirePositive(band.max, 'band.max')
  if (band.max < band.min) throw new RangeError(`band.max (${band.max}) must not be below band.min (${band.min})`)
  const gap = quenchMm(deckClearanceMm, compressedGasketMm)
  let status: QuenchStatus = 'ok'
  if (gap <= 0) status = 'contact'
  else if (gap < band.min - LIMIT_EPSILON_MM) status = 'tight'
  else if (gap > band.max + LIMIT_EPSILON_MM) status = 'wide'
  return { quenchMm: gap, band: { min: band.min, max: band.max }, status }
}
