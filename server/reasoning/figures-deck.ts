import { checkDeckFinish, type HeadGasketConstruction } from '../../shared/engineering/deck-finish'
import type { BuildContext } from '../../shared/schemas/build'
import type { SlotParts } from './figures'

/** One face (the block's deck or the head's face) against the gasket it seals on. */
export type FaceFigure = {
  status: 'ok' | 'resurface'
  raUm: number
  flatnessMm: number
  maxRaUm: number
  maxFlatnessMm: number
  /** What is wrong, in the shop's words ("Finish Ra 2.4 µm is rougher than …"), joined. */
  problems: string
}

export type DeckFinishFigures = {
  construction: HeadGasketConstruction
  /** "multi-layer steel" or "composite", for the rules' texts. */
  gasketWords: string
  /** Whether the build gives both of a face's measurements. */
  measured: boolean
  deck?: FaceFigure
  head?: FaceFigure
}

const WORDS: Record<HeadGasketConstruction, string> = { 'multi-layer-steel': 'multi-layer steel', composite: 'composite' }

function face(construction: HeadGasketConstruction, raUm: number | undefined, flatnessMm: number | undefined): FaceFigure | undefined {
  if (raUm === undefined || flatnessMm === undefined) return undefined
  const check = checkDeckFinish({ construction, raUm, flatnessMm })
  return {
    status: check.status,
    raUm,
    flatnessMm,
    maxRaUm: Math.round(check.limits.maxRaUm * 100) / 100,
    maxFlatnessMm: check.limits.maxFlatnessMm,
    problems: check.problems.map((problem) => problem.text).join('; '),
  }
}

/**
 * The deck and head face as measured on this engine (the build's context), against the
 * head gasket's construction; undefined for a gasket without a finish table (copper).
 */
export function deckFinishFigures(parts: SlotParts, context: BuildContext): DeckFinishFigures | undefined {
  const construction = parts['head-gasket']?.attributes.construction
  if (construction !== 'multi-layer-steel' && construction !== 'composite') return undefined
  const deck = parts.block ? face(construction, context.deckRaUm, context.deckFlatnessMm) : undefined
  const head = parts.head ? face(construction, context.headRaUm, context.headFlatnessMm) : undefined
  return { construction, gasketWords: WORDS[construction], measured: Boolean(deck || head), ...(deck && { deck }), ...(head && { head }) }
}
