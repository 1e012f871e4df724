/**
 * Static compression ratio, after Heywood, Internal Combustion Engine Fundamentals, sec. 2.2:
 * CR = (Vs + Vc) / Vc per cylinder. Lengths in mm, volumes in cm³ (cc).
 */
import { requireFinite, requireNonNegative, requirePositive } from './guards'

const MM3_PER_CC = 1000

/** π/4·d²·h in cc. Left unchecked on purpose: a negative height (piston proud of the deck) must give a negative volume. */
export function cylinderVolumeCc(diameterMm: number, heightMm: number): number {
  return ((Math.PI / 4) * diameterMm * diameterMm * heightMm) / MM3_PER_CC
}

/** Volume one piston sweeps from bottom to top dead centre. */
export function sweptVolumeCc(boreMm: number, strokeMm: number): number {
  requirePositive(boreMm, 'boreMm')
  requirePositive(strokeMm, 'strokeMm')
  return cylinderVolumeCc(boreMm, strokeMm)
}

export type CompressionInput = {
  boreMm: number
  strokeMm: number
  chamberCc: number
  gasketBoreMm: number
  gasketThicknessMm: number
  /** Piston below deck at TDC positive, above (proud) negative. */
  deckClearanceMm: number
  /** Dish or valve reliefs positive, dome negative: a dome takes volume out of the chamber. */
  pistonVolumeCc: number
}

export type CompressionResult = {
  sweptCc: number
  gasketCc: number
  deckCc: number
  clearanceCc: number
  ratio: number
}

type ClearanceParts = { sweptCc: number; gasketCc: number; deckCc: number }

function clearanceParts(input: Omit<CompressionInput, 'chamberCc'>): ClearanceParts {
  requirePositive(input.gasketBoreMm, 'gasketBoreMm')
  requireNonNegative(input.gasketThicknessMm, 'gasketThicknessMm')
  requireFinite(input.deckClearanceMm, 'deckClearanceMm')
  requireFinite(input.pistonVolumeCc, 'pistonVolumeCc')
  return {
    sweptCc: sweptVolumeCc(input.boreMm, input.strokeMm),
    gasketCc: cylinderVolumeCc(input.gasketBoreMm, input.gasketThicknessMm),
    // The deck slice is at the cylinder bore, not the gasket bore: the piston fills the bore.
    deckCc: cylinderVolumeCc(input.boreMm, input.deckClearanceMm),
  }
}

export function staticCompressionRatio(input: CompressionInput): CompressionResult {
  requirePositive(input.chamberCc, 'chamberCc')
  const parts = clearanceParts(input)
  const clearanceCc = input.chamberCc + parts.gasketCc + parts.deckCc + input.pistonVolumeCc
  if (clearanceCc <= 0) {
    // A dome or a proud piston bigger than the chamber means the parts would collide.
    throw new RangeError(
      `Clearance volume must be positive, got ${clearanceCc.toFixed(3)} cc: ` +
        'the piston dome or deck height leaves no room in the chamber',
    )
  }
  return { ...parts, clearanceCc, ratio: (parts.sweptCc + clearanceCc) / clearanceCc }
}

/** Chamber volume a head must have for the given bottom end and gasket to reach `targetRatio`. */
export function chamberForRatio(input: Omit<CompressionInput, 'chamberCc'>, targetRatio: number): number {
  if (!Number.isFinite(targetRatio) || targetRatio <= 1) {
    throw new RangeError(`targetRatio must be greater than 1, got ${targetRatio}`)
  }
  const parts = clearanceParts(input)
  const clearanceCc = parts.sweptCc / (targetRatio - 1)
  const chamberCc = clearanceCc - parts.gasketCc - parts.deckCc - input.pistonVolumeCc
  if (chamberCc <= 0) {
    throw new RangeError(
      `A ratio of ${targetRatio} cannot be reached with this gasket, deck and piston: ` +
        `it would need a chamber of ${chamberCc.toFixed(3)} cc`,
    )
  }
  return chamberCc
}
