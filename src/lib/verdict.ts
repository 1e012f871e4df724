import { BUILD_SLOTS } from '@shared/build-template'
import type { Evaluation, FillResult } from '@shared/schemas/build'
import type { Verdict } from '@shared/schemas/fitment'
import { slotLabel } from './slot-status'

const HEADLINES: Record<Verdict, string> = {
  fits: 'The build fits',
  'fits-with-modification': 'The build fits with modifications',
  'does-not-fit': 'The build does not fit',
  unknown: 'No verdict yet',
}
/** While slots are empty the verdict is about the parts chosen so far, and says so. */
const PARTIAL_HEADLINES: Record<Verdict, string> = {
  ...HEADLINES,
  fits: 'The parts chosen so far fit',
  'fits-with-modification': 'The parts chosen so far fit with modifications',
  'does-not-fit': 'The parts chosen so far do not fit',
}

const plural = (count: number, word: string) => `${count} ${word}${count === 1 ? '' : 's'}`

export function verdictHeadline(verdict: Verdict, partial: boolean): string {
  return (partial ? PARTIAL_HEADLINES : HEADLINES)[verdict]
}

/**
 * The headline with road-legality beside the mechanical verdict: a legal
 * blocker is never left out behind "fits".
 */
export function verdictBanner(evaluation: Pick<Evaluation, 'verdict' | 'compliance' | 'figures'>, partial: boolean): string {
  const headline = verdictHeadline(evaluation.verdict, partial)
  if (evaluation.compliance.status !== 'blocked') return headline
  const year = evaluation.figures.chassisModelYear
  return `${headline} — not road-legal${year ? ` for a ${year} car` : ''}`
}

/** What the compliance check says, in one line; empty when there is nothing to say. */
export function complianceLine(compliance: Evaluation['compliance']): string {
  if (compliance.status === 'ok') return ''
  const prefix = compliance.status === 'blocked' ? 'Not road-legal' : 'Check road-legality'
  return `${prefix}: ${compliance.reasons.join(' ')}`
}

/** The sentence under the headline: what decided the verdict, or what to do next. */
export function verdictDetail(evaluation: Pick<Evaluation, 'verdict' | 'pairs' | 'modifications'>): string {
  const { verdict, pairs, modifications } = evaluation
  if (verdict === 'does-not-fit') {
    return `Does not fit: ${pairs
      .filter((pair) => pair.relation === 'does-not-fit')
      .map((pair) => pair.label)
      .join('; ')}.`
  }
  if (verdict === 'fits-with-modification') return `${plural(modifications.length, 'modification')} needed: see the checklist.`
  if (verdict === 'unknown') {
    const open = pairs.filter((pair) => pair.relation === 'unknown').map((pair) => pair.label)
    return open.length
      ? `No catalogue link or rule covers ${open.join('; ')}: check by hand.`
      : 'Choose a part for a slot that mates with the parts chosen so far (a head for a block, say).'
  }
  return pairs.length === 1 ? 'The one mating pair fits as it is.' : `All ${pairs.length} mating pairs fit as they are.`
}

/** The empty slots' labels, in template order. */
export function missingSlotLabels(missingSlots: readonly string[]): string[] {
  return BUILD_SLOTS.filter((slot) => missingSlots.includes(slot.id)).map((slot) => slot.label)
}

export type FillSummary = { severity: 'success' | 'info'; summary: string; detail: string }

/** What "fill the gaps" did, for a toast: how many slots it filled and why the rest stay empty. */
export function fillGapsSummary({
  filled,
  unfilled,
  skipped = [],
}: Pick<FillResult, 'filled' | 'unfilled'> & Partial<Pick<FillResult, 'skipped'>>): FillSummary {
  const gaps = unfilled.length
    ? `Still empty: ${unfilled.map((gap) => `${slotLabel(gap.slot)} (${gap.note})`).join('; ')}`
    : 'Every slot now has a part.'
  const passed = skipped.length
    ? ` Passed over: ${skipped.map((skip) => `${skip.partNumber} for the ${slotLabel(skip.slot).toLowerCase()} (${skip.reason})`).join('; ')}`
    : ''
  return {
    severity: filled.length ? 'success' : 'info',
    summary: filled.length ? `Filled ${plural(filled.length, 'slot')}` : 'No empty slot could be filled',
    detail: gaps + passed,
  }
}
