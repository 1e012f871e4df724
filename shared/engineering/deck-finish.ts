/**
 * Deck and head face finish against the head gasket's construction. A composite (fibre- or
 * graphite-faced) gasket has a soft facing that fills machining marks; a multi-layer steel gasket
 * seals on thin coated steel and needs a smoother, flatter face [common practice]. The figures
 * below are the trade's usual ones, quoted in inches and microinches, and were not checked against
 * a published table: treat them as from memory. The service manual's figures govern when it gives
 * them, and they are often tighter over a short span than these overall limits.
 */
import { requireNonNegative, requirePositive } from './guards'
import { microinchToUm } from './units'

export type HeadGasketConstruction = 'multi-layer-steel' | 'composite'

export type DeckFinishLimits = {
  /** Roughest average roughness Ra the gasket seals on, µm. */
  maxRaUm: number
  /** Largest out-of-flat over the whole face, mm. */
  maxFlatnessMm: number
  source: string
}

/** From memory, common practice: MLS about 30 µin Ra and 0.002 in; composite about 125 µin Ra and 0.004 in. */
export const DECK_FINISH_LIMITS: Readonly<Record<HeadGasketConstruction, DeckFinishLimits>> = {
  'multi-layer-steel': { maxRaUm: microinchToUm(30), maxFlatnessMm: 0.05, source: 'common practice (from memory)' },
  composite: { maxRaUm: microinchToUm(125), maxFlatnessMm: 0.1, source: 'common practice (from memory)' },
}

export type DeckFinishInput = {
  construction: HeadGasketConstruction
  /** Measured on the deck or the head face; check each face on its own. */
  raUm: number
  flatnessMm: number
  /** The manual's limits replace the table's wherever given. */
  serviceManual?: { maxRaUm?: number; maxFlatnessMm?: number }
}

export type DeckFinishProblem = { kind: 'too-rough' | 'out-of-flat'; measured: number; limit: number; text: string }

export type DeckFinishCheck = {
  /** 'resurface': machine the face (a deck-repair modification); never fill gouges with epoxy. */
  status: 'ok' | 'resurface'
  limits: DeckFinishLimits
  problems: DeckFinishProblem[]
}

const LIMIT_EPSILON = 1e-9

function limitsFor({ construction, serviceManual }: DeckFinishInput): DeckFinishLimits {
  const table = DECK_FINISH_LIMITS[construction]
  const manual = serviceManual ?? {}
  if (manual.maxRaUm === undefined && manual.maxFlatnessMm === undefined) return table
  return {
    maxRaUm: requirePositive(manual.maxRaUm ?? table.maxRaUm, 'serviceManual.maxRaUm'),
    maxFlatnessMm: requirePositive(manual.maxFlatnessMm ?? table.maxFlatnessMm, 'serviceManual.maxFlatnessMm'),
    source: 'service manual',
  }
}

export function checkDeckFinish(input: DeckFinishInput): DeckFinishCheck {
  requireNonNegative(input.raUm, 'raUm')
  requireNonNegative(input.flatnessMm, 'flatnessMm')
  const limits = limitsFor(input)
  const gasket = input.construction === 'multi-layer-steel' ? 'a multi-layer steel gasket' : 'a composite gasket'
  const problems: DeckFinishProblem[] = []
  if (input.raUm > limits.maxRaUm + LIMIT_EPSILON) {
    problems.push({
      kind: 'too-rough',
      measured: input.raUm,
      limit: limits.maxRaUm,
      text: `Finish Ra ${input.raUm} µm is rougher than the ${Number(limits.maxRaUm.toFixed(2))} µm ${gasket} seals on: resurface`,
    })
  }
  if (input.flatnessMm > limits.maxFlatnessMm + LIMIT_EPSILON) {
    problems.push({
      kind: 'out-of-flat',
      measured: input.flatnessMm,
      limit: limits.maxFlatnessMm,
      text: `Face is ${input.flatnessMm} mm out of flat, more than the ${limits.maxFlatnessMm} mm allowed under ${gasket}: resurface`,
    })
  }
  return { status: problems.length === 0 ? 'ok' : 'resurface', limits, problems }
}
