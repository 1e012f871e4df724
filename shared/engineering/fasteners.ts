/**
 * Fastener rules. Torque–tension T = K·D·F after Shigley's Mechanical Engineering Design
 * (10th ed.), sec. 8-8; thread engagement and blind-hole fit are common practice. Lengths in
 * mm, forces in N, torques in N·m. The service manual's specification always governs.
 */
import { requireFinite, requireNonNegative, requirePositive } from './guards'

export type ThreadMaterial = 'steel' | 'cast-iron' | 'aluminium'

/** Engagement as a multiple of nominal diameter [common practice]: softer parent metal needs more threads to match the bolt. */
export const MIN_ENGAGEMENT_FACTOR: Record<ThreadMaterial, number> = {
  steel: 1.0,
  'cast-iron': 1.5,
  aluminium: 2.0,
}

const MM_PER_M = 1000
/** Far below any machining tolerance; keeps float rounding in the sums from flipping a bolt that sits exactly on a limit. */
const LIMIT_EPSILON_MM = 1e-9

export function minThreadEngagementMm(diameterMm: number, material: ThreadMaterial): number {
  requirePositive(diameterMm, 'diameterMm')
  return diameterMm * MIN_ENGAGEMENT_FACTOR[material]
}

export function tighteningTorqueNm({
  nutFactor,
  diameterMm,
  preloadN,
}: {
  nutFactor: number
  diameterMm: number
  preloadN: number
}): number {
  requirePositive(nutFactor, 'nutFactor')
  requirePositive(diameterMm, 'diameterMm')
  requireNonNegative(preloadN, 'preloadN')
  return (nutFactor * diameterMm * preloadN) / MM_PER_M
}

export function preloadForTorqueN({
  torqueNm,
  nutFactor,
  diameterMm,
}: {
  torqueNm: number
  nutFactor: number
  diameterMm: number
}): number {
  requireNonNegative(torqueNm, 'torqueNm')
  requirePositive(nutFactor, 'nutFactor')
  requirePositive(diameterMm, 'diameterMm')
  return (torqueNm * MM_PER_M) / (nutFactor * diameterMm)
}

/** Same preload with a different lubricant: T2 = T1·K2/K1. A lubricated thread needs less torque. */
export function torqueForNewLubricant(torque: number, kOld: number, kNew: number): number {
  requireNonNegative(torque, 'torque')
  requirePositive(kOld, 'kOld')
  requirePositive(kNew, 'kNew')
  return (torque * kNew) / kOld
}

export type HeadBoltInput = {
  boltLengthMm: number
  diameterMm: number
  pitchMm: number
  bossHeightMm: number
  /** Compressed thickness: that is what the bolt clamps once torqued. */
  gasketThicknessMm: number
  washerThicknessMm: number
  tappedDepthMm: number
  material: ThreadMaterial
  /** Unthreaded run-out left at the bottom of a blind hole; 2 pitches by default [common practice]. */
  clearancePitches?: number
}

export type HeadBoltStatus = 'ok' | 'bottoms' | 'too-short'

export type HeadBoltCheck = {
  gripMm: number
  projectionMm: number
  minEngagementMm: number
  maxProjectionMm: number
  status: HeadBoltStatus
  /** min > max when the tapped hole is too shallow for any length to engage enough. */
  lengthRangeMm: { min: number; max: number }
  /** Extra grip (hardened washers or a spacer) that brings projection down to the maximum; 0 unless it bottoms. */
  extraGripNeededMm: number
}

/**
 * A bolt in a blind hole must engage enough thread yet stop short of the bottom: a bottomed
 * bolt gives a false torque reading and can crack the boss.
 */
export function checkHeadBolt(input: HeadBoltInput): HeadBoltCheck {
  requirePositive(input.boltLengthMm, 'boltLengthMm')
  requirePositive(input.pitchMm, 'pitchMm')
  requireNonNegative(input.bossHeightMm, 'bossHeightMm')
  requireNonNegative(input.gasketThicknessMm, 'gasketThicknessMm')
  requireNonNegative(input.washerThicknessMm, 'washerThicknessMm')
  requirePositive(input.tappedDepthMm, 'tappedDepthMm')
  const clearancePitches = requireNonNegative(requireFinite(input.clearancePitches ?? 2, 'clearancePitches'), 'clearancePitches')

  const gripMm = input.bossHeightMm + input.gasketThicknessMm + input.washerThicknessMm
  const projectionMm = input.boltLengthMm - gripMm
  const minEngagementMm = minThreadEngagementMm(input.diameterMm, input.material)
  const maxProjectionMm = input.tappedDepthMm - clearancePitches * input.pitchMm

  let status: HeadBoltStatus = 'ok'
  // Bottoming is checked first: it is the failure that damages parts.
  if (projectionMm > maxProjectionMm + LIMIT_EPSILON_MM) status = 'bottoms'
  else if (projectionMm < minEngagementMm - LIMIT_EPSILON_MM) status = 'too-short'

  return {
    gripMm,
    projectionMm,
    minEngagementMm,
    maxProjectionMm,
    status,
    lengthRangeMm: { min: gripMm + minEngagementMm, max: gripMm + maxProjectionMm },
    extraGripNeededMm: status === 'bottoms' ? projectionMm - maxProjectionMm : 0,
  }
}

/**
 * The thinnest of the offered spacer or washer stacks that stops a bottoming bolt, or null when
 * none does or the bolt does not bottom (a spacer cannot lengthen a short bolt). This is a fix
 * with modification for ordinary bolts only: extra grip voids a torque-angle specification, and
 * a bolt of the right length is the better fix.
 */
export function spacerFix(input: HeadBoltInput, spacerOptionsMm: number[]): { spacerMm: number; check: HeadBoltCheck } | null {
  if (checkHeadBolt(input).status !== 'bottoms') return null
  const candidates = spacerOptionsMm.map((mm) => requirePositive(mm, 'spacer thickness')).sort((a, b) => a - b)
  for (const spacerMm of candidates) {
    const check = checkHeadBolt({ ...input, washerThicknessMm: input.washerThicknessMm + spacerMm })
    if (check.status === 'ok') return { spacerMm, check }
  }
  return null
}
