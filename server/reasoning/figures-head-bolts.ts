import { planHeadBoltWashers, type PositionAnswer } from '../../shared/engineering/head-bolt-washers'
import type { ThreadMaterial } from '../../shared/engineering/fasteners'
import { parseBossHeights, parseMetricThread } from '../../shared/schemas/part-attributes'
import type { Companions } from './figures-ignition'
import type { SlotParts } from './figures'
import { num } from './part-values'

/**
 * The head bolts over a head whose bosses differ by position: what the odd
 * positions (the ones whose boss is not the head's usual height) need.
 */
export type HeadBoltPositionFigures = {
  /** The worst of the odd positions: all fit, washers under some, or another bolt length. */
  status: 'ok' | 'washers' | 'bolt-length' | 'no-length'
  /** Each odd position's answer, "Position 9 (boss 96.5 mm): …", joined. */
  summary: string
  /** Extra hardened washers in all, and the stocked parts they come from. */
  washerCount: number
  washerParts: string
  /** One bolt length that fits every position, when there is one, e.g. "116–121 mm". */
  commonLength?: string
}

const lowerFirst = (text: string) => text.charAt(0).toLowerCase() + text.slice(1)

const RANK = { none: 0, washers: 1, 'bolt-length': 2, 'no-length': 3 } as const
const STATUS = ['ok', 'washers', 'bolt-length', 'no-length'] as const

export function headBoltPositionFigures(parts: SlotParts, companions: Companions): HeadBoltPositionFigures | undefined {
  const positions = parseBossHeights(parts.head?.attributes.bossHeightsMm)
  const usual = num(parts.head, 'boltBossHeightMm')
  const bolt = parts['head-bolt']
  const thread = parseMetricThread(String(bolt?.attributes.thread ?? ''))
  const boltLengthMm = num(bolt, 'lengthMm')
  const compressedGasketMm = num(parts['head-gasket'], 'compressedThicknessMm')
  const tappedDepthMm = num(parts.block, 'tappedDepthMm')
  const material = parts.block?.attributes.material as ThreadMaterial | undefined
  if (!positions || !thread || boltLengthMm === undefined || compressedGasketMm === undefined || tappedDepthMm === undefined || !material) {
    return undefined
  }
  const odd = (answer: PositionAnswer) => usual === undefined || Math.abs(answer.bossHeightMm - usual) > 1e-9
  const washers = companions.headBoltWashers ?? []
  let plan: ReturnType<typeof planHeadBoltWashers>
  try {
    plan = planHeadBoltWashers({
      positions,
      boltLengthMm,
      diameterMm: thread.diameterMm,
      pitchMm: thread.pitchMm,
      compressedGasketMm,
      tappedDepthMm,
      material,
      standardWasherMm: num(bolt, 'washerThicknessMm') ?? 0,
      stockedWashersMm: washers.map((part) => Number(part.attributes.thicknessMm)),
      torqueToYield: bolt?.attributes.torqueToYield === true,
    })
  } catch {
    return undefined
  }
  const answers = plan.positions.filter(odd)
  if (answers.length === 0) return undefined
  const worst = Math.max(...answers.map((answer) => RANK[answer.fix]))
  const used = new Set(answers.flatMap((answer) => answer.washersMm))
  const washerParts = washers.filter((part) => used.has(Number(part.attributes.thicknessMm))).map((part) => part.partNumber)
  const common = plan.commonLengthRangeMm
  const commonLength = common ? `${Math.ceil(common.min)}–${Math.floor(common.max)} mm` : undefined
  const status = STATUS[worst]!
  const each = answers.map((answer) => `Position ${answer.position} (boss ${answer.bossHeightMm} mm): ${lowerFirst(answer.reason)}`)
  // Where a bolt must change anyway, one length for the whole set is what the counter orders.
  if (status === 'bolt-length' && commonLength) each.push(`a set of ${commonLength} bolts fits every position`)
  return {
    status,
    summary: each.join('; '),
    washerCount: answers.reduce((sum, answer) => sum + answer.washersMm.length, 0),
    washerParts: washerParts.join(', '),
    ...(commonLength ? { commonLength } : {}),
  }
}
