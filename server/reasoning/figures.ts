import type { SlotId } from '../../shared/build-template'
import { staticCompressionRatio } from '../../shared/engineering/compression'
import { checkHeadBolt, spacerFix, type HeadBoltInput, type ThreadMaterial } from '../../shared/engineering/fasteners'
import { checkInjectorCalibration, type CalibrationStatus } from '../../shared/engineering/injector-calibration'
import { injectorHeadroom } from '../../shared/engineering/injectors'
import { checkQuench, type QuenchStatus } from '../../shared/engineering/quench'
import { beltTeethForCentre, centreDistanceForBeltMm } from '../../shared/engineering/timing-belt'
import { parseMetricThread } from '../../shared/schemas/part-attributes'
import type { BuildContext } from '../../shared/schemas/build'
import type { Part } from '../../shared/schemas/part'
import type { DeckFinishFigures } from './figures-deck'
import { num, text } from './part-values'
import type { HeadBoltPositionFigures } from './figures-head-bolts'
import type { IgnitionFigures } from './figures-ignition'

/** What the figures read of a part. */
export type FigurePart = Pick<Part, 'attributes' | 'yearTo'>
export type SlotParts = Partial<Record<SlotId, FigurePart>>

/** Figures as the rules read them (facts), richer than the API's summary. */
export type FigureFacts = {
  displacementCc?: number
  compressionRatio?: number
  sweptVolumeCc?: number
  clearanceVolumeCc?: number
  gasketBoreExcessMm?: number
  oilRestrictors?: number
  vvlMatch?: boolean
  headBolt?: {
    status: 'ok' | 'bottoms' | 'too-short'
    projectionMm: number
    minEngagementMm: number
    maxProjectionMm: number
    lengthRangeMm: { min: number; max: number }
    washerStackMm?: number
  }
  /** Bolt positions whose boss differs from the head's usual height, where the head lists them. */
  headBoltPositions?: HeadBoltPositionFigures
  timing?: { centreMm: number; centreShiftMm?: number; centreShiftAbsMm?: number; beltTeethNeeded?: number }
  injector?: { neededCcMin: number; availableCcMin: number; headroomPct: number; railPressureBar: number }
  quench?: { mm: number; status: QuenchStatus; minMm: number; maxMm: number }
  injectorCalibration?: {
    status: CalibrationStatus
    mismatchPct: number
    mismatchAbsPct: number
    tolerancePct: number
    calibratedCcMin: number
  }
  engineModelYear?: number
  ignition?: IgnitionFigures
  /** Deck and head face as measured, against the gasket's construction. */
  deckFinish?: DeckFinishFigures
  fuelSystemOpened?: boolean
  electricsTouched?: boolean
}

/** Hardened washer stacks on offer, thinnest first (whole millimetres up to a spacer's 8 mm). */
const WASHER_STACKS_MM = [1, 2, 3, 4, 5, 6, 7, 8]

const round = (value: number, places = 3) => Math.round(value * 10 ** places) / 10 ** places

export function compression(parts: SlotParts): Pick<FigureFacts, 'compressionRatio' | 'sweptVolumeCc' | 'clearanceVolumeCc'> {
  const { block, head } = parts
  const gasket = parts['head-gasket']
  const input = {
    boreMm: num(block, 'boreMm'),
    strokeMm: num(block, 'strokeMm'),
    chamberCc: num(head, 'chamberCc'),
    gasketBoreMm: num(gasket, 'boreMm'),
    gasketThicknessMm: num(gasket, 'compressedThicknessMm'),
    deckClearanceMm: num(block, 'deckClearanceMm') ?? 0,
    pistonVolumeCc: num(block, 'pistonVolumeCc') ?? 0,
  }
  const { boreMm, strokeMm, chamberCc, gasketBoreMm, gasketThicknessMm } = input
  if (!boreMm || !strokeMm || !chamberCc || !gasketBoreMm || !gasketThicknessMm) return {}
  try {
    const result = staticCompressionRatio({ ...input, boreMm, strokeMm, chamberCc, gasketBoreMm, gasketThicknessMm })
    return { compressionRatio: round(result.ratio, 2), sweptVolumeCc: round(result.sweptCc), clearanceVolumeCc: round(result.clearanceCc) }
  } catch {
    return {}
  }
}

export function headBolt(parts: SlotParts): FigureFacts['headBolt'] {
  const bolt = parts['head-bolt']
  const thread = parseMetricThread(text(bolt, 'thread') ?? '')
  const material = text(parts.block, 'material') as ThreadMaterial | undefined
  const input: Partial<HeadBoltInput> = {
    boltLengthMm: num(bolt, 'lengthMm'),
    diameterMm: thread?.diameterMm,
    pitchMm: thread?.pitchMm,
    bossHeightMm: num(parts.head, 'boltBossHeightMm'),
    gasketThicknessMm: num(parts['head-gasket'], 'compressedThicknessMm'),
    washerThicknessMm: num(bolt, 'washerThicknessMm') ?? 0,
    tappedDepthMm: num(parts.block, 'tappedDepthMm'),
    material,
  }
  if (Object.values(input).some((value) => value === undefined)) return undefined
  let check: ReturnType<typeof checkHeadBolt>
  let fix: ReturnType<typeof spacerFix>
  try {
    // Every field was checked above; the engineering functions reject impossible values.
    check = checkHeadBolt(input as HeadBoltInput)
    fix = spacerFix(input as HeadBoltInput, WASHER_STACKS_MM)
  } catch {
    return undefined
  }
  return {
    status: check.status,
    projectionMm: round(check.projectionMm, 2),
    minEngagementMm: round(check.minEngagementMm, 2),
    maxProjectionMm: round(check.maxProjectionMm, 2),
    lengthRangeMm: { min: Math.ceil(check.lengthRangeMm.min), max: Math.floor(check.lengthRangeMm.max) },
    ...(fix ? { washerStackMm: fix.spacerMm } : {}),
  }
}

export function timing(parts: SlotParts): FigureFacts['timing'] {
  const crankToDeck = num(parts.block, 'crankToDeckMm')
  const gasket = num(parts['head-gasket'], 'compressedThicknessMm')
  const camAboveDeck = num(parts.head, 'camAboveDeckMm')
  if (crankToDeck === undefined || gasket === undefined || camAboveDeck === undefined) return undefined
  // Cam and crank sit on the bore axis in these engines, so the centre distance is a straight stack-up.
  const centreMm = crankToDeck + gasket + camAboveDeck
  const smallTeeth = num(parts['crank-pulley'], 'teeth')
  const largeTeeth = num(parts['cam-gear'], 'teeth')
  const pitchMm = num(parts['timing-belt'], 'pitchMm')
  const beltTeeth = num(parts['timing-belt'], 'teeth')
  if (smallTeeth === undefined || largeTeeth === undefined || pitchMm === undefined) return { centreMm: round(centreMm, 2) }
  const beltTeethNeeded = round(beltTeethForCentre({ smallTeeth, largeTeeth, pitchMm, centreMm }), 2)
  if (beltTeeth === undefined) return { centreMm: round(centreMm, 2), beltTeethNeeded }
  try {
    const shift = centreDistanceForBeltMm({ smallTeeth, largeTeeth, pitchMm, beltTeeth }) - centreMm
    return { centreMm: round(centreMm, 2), centreShiftMm: round(shift, 2), centreShiftAbsMm: round(Math.abs(shift), 2), beltTeethNeeded }
  } catch {
    return { centreMm: round(centreMm, 2), beltTeethNeeded }
  }
}

export function injector(parts: SlotParts, context: BuildContext): FigureFacts['injector'] {
  const flowCcMin = num(parts.injector, 'flowCcMin')
  const ratedPressureBar = num(parts.injector, 'ratedPressureBar')
  if (!context.targetPowerKw || flowCcMin === undefined || ratedPressureBar === undefined) return undefined
  const railPressureBar = num(parts['fuel-rail'], 'pressureBar') ?? ratedPressureBar
  let result: ReturnType<typeof injectorHeadroom>
  try {
    result = injectorHeadroom({
      targetPowerKw: context.targetPowerKw,
      injectors: cylinders(parts),
      flowCcMin,
      ratedPressureBar,
      railPressureBar,
    })
  } catch {
    return undefined
  }
  return {
    neededCcMin: round(result.neededCcMin, 1),
    availableCcMin: round(result.availableCcMin, 1),
    headroomPct: round(result.headroomPct, 1),
    railPressureBar,
  }
}

/** The fitted injectors against the flow the control unit's fuel map was calibrated for. */
export function injectorCalibration(parts: SlotParts): FigureFacts['injectorCalibration'] {
  const input = {
    fittedFlowCcMin: num(parts.injector, 'flowCcMin'),
    fittedRatedPressureBar: num(parts.injector, 'ratedPressureBar'),
    calibratedFlowCcMin: num(parts.ecu, 'calibratedInjectorCcMin'),
    calibratedPressureBar: num(parts.ecu, 'calibratedInjectorPressureBar'),
  }
  const { fittedFlowCcMin, fittedRatedPressureBar, calibratedFlowCcMin, calibratedPressureBar } = input
  if (!fittedFlowCcMin || !fittedRatedPressureBar || !calibratedFlowCcMin || !calibratedPressureBar) return undefined
  const check = checkInjectorCalibration({ fittedFlowCcMin, fittedRatedPressureBar, calibratedFlowCcMin, calibratedPressureBar })
  return {
    status: check.status,
    mismatchPct: round(check.mismatchPct, 1),
    mismatchAbsPct: round(Math.abs(check.mismatchPct), 1),
    tolerancePct: check.tolerancePct,
    calibratedCcMin: calibratedFlowCcMin,
  }
}

/** Quench from the block's deck clearance and the gasket's compressed thickness, against the usual band. */
export function quench(parts: SlotParts): FigureFacts['quench'] {
  const deckClearanceMm = num(parts.block, 'deckClearanceMm')
  const compressedGasketMm = num(parts['head-gasket'], 'compressedThicknessMm')
  if (deckClearanceMm === undefined || compressedGasketMm === undefined) return undefined
  try {
    const check = checkQuench({ deckClearanceMm, compressedGasketMm })
    return { mm: round(check.quenchMm, 2), status: check.status, minMm: check.band.min, maxMm: check.band.max }
  } catch {
    return undefined
  }
}

/** Cylinders of the build: from the block, else from the lead set, else four. */
export function cylinders(parts: SlotParts): number {
  return num(parts.block, 'cylinders') ?? num(parts['ignition-leads'], 'cylinders') ?? 4
}
