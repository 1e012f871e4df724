import type { ExplanationStep, Verdict } from '../../shared/schemas/fitment'
import { verdictRank } from '../../shared/schemas/fitment'

/**
 * Evidence in the order a technician reads it: what decided first, then the
 * rest failing before passing. Notes stay after the step they comment on.
 */
export function orderEvidence(steps: ExplanationStep[], relation: Verdict): ExplanationStep[] {
  const rank = (step: ExplanationStep) => {
    if (step.type === 'note' || !step.relation) return -1
    return step.relation === relation ? 100 : verdictRank(step.relation)
  }
  const rules = steps.filter((step) => step.type === 'rule')
  if (rules.length === 0) return steps
  const ordered = [...rules].map((step, index) => ({ step, index })).sort((a, b) => rank(b.step) - rank(a.step) || a.index - b.index)
  let next = 0
  return steps.map((step) => (step.type === 'rule' ? ordered[next++]!.step : step))
}

/**
 * The one sentence that decided a pair: the failing rule's or link's text for
 * does-not-fit, the modification's for fits-with-modification.
 */
export function decidingReason(
  relation: Verdict,
  decidedBy: 'link' | 'rule' | 'none',
  steps: ExplanationStep[],
  modificationReasons: string[],
): string {
  if (decidedBy === 'none') return steps[0]?.text ?? 'No reviewed link and no rule decides this pair: check it by hand.'
  if (relation === 'fits-with-modification' && modificationReasons[0]) return modificationReasons[0]
  const deciding =
    decidedBy === 'link'
      ? steps.find((step) => step.type === 'link' && step.relation === relation)
      : steps.find((step) => step.type === 'rule' && step.relation === relation)
  return deciding?.text ?? steps[0]?.text ?? relation
}
