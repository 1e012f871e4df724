/**
 * Drive dog engagement under an adapter plate. A plate between a distributor (or oil pump) and its
 * mount lifts the body by the plate's thickness while the shaft stays the same length, so the dog
 * at the shaft's end comes that far out of its slot: engagement left = dog depth − plate thickness
 * (a straight stack-up). Lengths in mm.
 */
import { requireNonNegative, requirePositive } from './guards'

/**
 * Common practice, from memory: keep at least two thirds of the dog's own depth engaged. Less and
 * the dog's edges carry the drive torque on a sliver and wear or break, and the shaft can walk up
 * out of the slot. The maker's figure governs where it gives one.
 */
export const MIN_DOG_ENGAGEMENT_SHARE = 2 / 3

/** 'longer-dog': the listed longer drive dog (or coupler) restores the minimum; 'too-short': nothing does. */
export type DriveDogStatus = 'ok' | 'longer-dog' | 'too-short'

export type DriveDogInput = {
  /** How deep the dog sits in its slot with the body on its own flange. */
  dogDepthMm: number
  plateThicknessMm: number
  /** How much longer a listed service dog or coupler is; absent or 0 when none is listed. */
  longerDogMm?: number
}

export type DriveDogCheck = {
  /** Engagement left with the plate fitted (0 when the dog no longer reaches its slot). */
  engagementMm: number
  minEngagementMm: number
  /** Engagement with the longer dog, which can sit no deeper than the slot (the dog's own depth). */
  withLongerDogMm?: number
  status: DriveDogStatus
}

export function checkDriveDog(input: DriveDogInput): DriveDogCheck {
  const depth = requirePositive(input.dogDepthMm, 'dogDepthMm')
  const plate = requireNonNegative(input.plateThicknessMm, 'plateThicknessMm')
  const longer = requireNonNegative(input.longerDogMm ?? 0, 'longerDogMm')
  const engagementMm = Math.max(0, depth - plate)
  const minEngagementMm = depth * MIN_DOG_ENGAGEMENT_SHARE
  if (engagementMm >= minEngagementMm) return { engagementMm, minEngagementMm, status: 'ok' }
  if (longer === 0) return { engagementMm, minEngagementMm, status: 'too-short' }
  const withLongerDogMm = Math.min(depth, depth - plate + longer)
  return { engagementMm, minEngagementMm, withLongerDogMm, status: withLongerDogMm >= minEngagementMm ? 'longer-dog' : 'too-short' }
}
