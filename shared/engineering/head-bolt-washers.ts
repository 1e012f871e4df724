/**
 * Head bolts over bosses of different heights. Where one boss sits lower than the rest (a later
 * head, a repaired corner), the same bolt projects further there and can bottom in its blind hole;
 * hardened washers under THAT bolt only take up the difference, as long as enough thread still
 * engages [common practice]. A washer cannot lengthen a bolt that is already short,
 * and torque-to-yield bolts never get washers: extra grip voids the torque-angle specification.
 * In those cases the answer is the bolt length that fits. Lengths in mm.
 */
import { requireNonNegative, requirePositiveInteger } from './guards'
import { checkHeadBolt, type HeadBoltCheck, type HeadBoltInput, type ThreadMaterial } from './fasteners'

export type BossPosition = { position: string; bossHeightMm: number }

export type WasherStackInput = {
  positions: BossPosition[]
  boltLengthMm: number
  diameterMm: number
  pitchMm: number
  /** Compressed thickness: that is what the bolt clamps once torqued. */
  compressedGasketMm: number
  tappedDepthMm: number
  material: ThreadMaterial
  /** The washer every bolt already has; 0 when the bolt seats on the boss. */
  standardWasherMm: number
  /** Hardened washer thicknesses the catalogue stocks for this thread. */
  stockedWashersMm: number[]
  torqueToYield: boolean
  /** Each extra washer is another face that can relax and lose clamp, so keep stacks short. */
  maxWashers?: number
  clearancePitches?: number
}

/** 'no-length': the tapped hole is too shallow for any bolt to engage enough thread. */
export type WasherFix = 'none' | 'washers' | 'bolt-length' | 'no-length'

export type PositionAnswer = {
  position: string
  bossHeightMm: number
  fix: WasherFix
  /** Extra hardened washers under this bolt only, thickest first; empty unless fix is 'washers'. */
  washersMm: number[]
  stackMm: number
  /** The bolt as it would be fitted: with the stack when fix is 'washers', otherwise as it stands. */
  check: HeadBoltCheck
  /** Bolt lengths that fit this position over the standard washer alone. */
  lengthRangeMm: { min: number; max: number }
  reason: string
}

export type WasherStackPlan = {
  positions: PositionAnswer[]
  /** One bolt length that fits every position over the standard washer, or null when none does. */
  commonLengthRangeMm: { min: number; max: number } | null
}

/** Common practice: one extra hardened washer, two at most. */
export const DEFAULT_MAX_WASHERS = 2

const mm = (value: number): string => `${Number(value.toFixed(2))} mm`
const range = ({ min, max }: { min: number; max: number }): string => `${Number(min.toFixed(2))}–${mm(max)}`

/** Every multiset of up to `maxCount` stocked thicknesses, fewest washers first, then thinnest. */
function candidateStacks(stockedMm: number[], maxCount: number): number[][] {
  const sizes = [...new Set(stockedMm)].sort((a, b) => b - a)
  const stacks: number[][] = []
  const grow = (stack: number[], from: number): void => {
    if (stack.length > 0) stacks.push(stack)
    if (stack.length === maxCount) return
    sizes.slice(from).forEach((size, k) => grow([...stack, size], from + k))
  }
  grow([], 0)
  const total = (stack: number[]): number => stack.reduce((sum, t) => sum + t, 0)
  return stacks.sort((a, b) => a.length - b.length || total(a) - total(b))
}

function answerFor(input: WasherStackInput, boss: BossPosition, stacks: number[][]): PositionAnswer {
  const bolt: HeadBoltInput = {
    boltLengthMm: input.boltLengthMm,
    diameterMm: input.diameterMm,
    pitchMm: input.pitchMm,
    bossHeightMm: boss.bossHeightMm,
    gasketThicknessMm: input.compressedGasketMm,
    washerThicknessMm: input.standardWasherMm,
    tappedDepthMm: input.tappedDepthMm,
    material: input.material,
    clearancePitches: input.clearancePitches,
  }
  const check = checkHeadBolt(bolt)
  const lengthRangeMm = check.lengthRangeMm
  const base = { position: boss.position, bossHeightMm: boss.bossHeightMm, washersMm: [], stackMm: 0, check, lengthRangeMm }
  if (lengthRangeMm.min > lengthRangeMm.max) {
    return {
      ...base,
      fix: 'no-length',
      reason: `The tapped hole is too shallow to engage the ${mm(check.minEngagementMm)} of thread this bolt needs: no bolt length fits`,
    }
  }
  if (check.status === 'ok') {
    return {
      ...base,
      fix: 'none',
      reason: `Fits as it stands: ${mm(check.projectionMm)} of bolt in the hole, ${range({ min: check.minEngagementMm, max: check.maxProjectionMm })} allowed`,
    }
  }
  const useLength = `use a bolt of ${range(lengthRangeMm)} at this position`
  if (check.status === 'too-short') {
    return {
      ...base,
      fix: 'bolt-length',
      reason: `Only ${mm(check.projectionMm)} of the ${mm(check.minEngagementMm)} thread engagement needed; washers cannot lengthen a bolt: ${useLength}`,
    }
  }
  if (input.torqueToYield) {
    return {
      ...base,
      fix: 'bolt-length',
      reason: `Bottoms by ${mm(check.extraGripNeededMm)}; torque-to-yield bolts never get washers (extra grip voids the torque-angle specification): ${useLength}`,
    }
  }
  for (const stack of stacks) {
    const stackMm = stack.reduce((sum, t) => sum + t, 0)
    const fitted = checkHeadBolt({ ...bolt, washerThicknessMm: input.standardWasherMm + stackMm })
    if (fitted.status === 'ok') {
      const count = stack.length === 1 ? 'one hardened washer' : `${stack.length} hardened washers`
      return {
        ...base,
        fix: 'washers',
        washersMm: stack,
        stackMm,
        check: fitted,
        reason: `Bottoms by ${mm(check.extraGripNeededMm)}: add ${count} (${stack.map(mm).join(' + ')}) under this bolt only, leaving ${mm(fitted.projectionMm)} in the hole; a bolt of ${range(lengthRangeMm)} is the better fix`,
      }
    }
  }
  return {
    ...base,
    fix: 'bolt-length',
    reason: `Bottoms by ${mm(check.extraGripNeededMm)} and no stack of stocked washers fixes it: ${useLength}`,
  }
}

/** Per bolt position: nothing to do, the washer stack from stocked thicknesses, or the bolt length that works. */
export function planHeadBoltWashers(input: WasherStackInput): WasherStackPlan {
  if (input.positions.length === 0) throw new RangeError('positions must list at least one bolt position')
  for (const boss of input.positions) requireNonNegative(boss.bossHeightMm, `bossHeightMm at ${boss.position}`)
  requireNonNegative(input.standardWasherMm, 'standardWasherMm')
  for (const t of input.stockedWashersMm) {
    if (!Number.isFinite(t) || t <= 0) throw new RangeError(`stockedWashersMm must hold positive thicknesses, got ${t}`)
  }
  const maxWashers = requirePositiveInteger(input.maxWashers ?? DEFAULT_MAX_WASHERS, 'maxWashers')
  const stacks = candidateStacks(input.stockedWashersMm, maxWashers)
  const positions = input.positions.map((boss) => answerFor(input, boss, stacks))
  const min = Math.max(...positions.map((p) => p.lengthRangeMm.min))
  const max = Math.min(...positions.map((p) => p.lengthRangeMm.max))
  return { positions, commonLengthRangeMm: min <= max ? { min, max } : null }
}
