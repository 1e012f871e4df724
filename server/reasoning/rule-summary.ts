import type { Caution } from '../../shared/schemas/build'
import { worstVerdict, type ExplanationStep, type Relation } from '../../shared/schemas/fitment'
import type { RuleOutcome } from './rule-book'
import type { RuleExtraPart } from './rule-file.schema'

/** `measured`: called for by the engine's measured condition, so it applies over a reviewed link too. */
export type RuleModification = { name: string; reason: string; extraParts: RuleExtraPart[]; ruleId: string; measured?: boolean }

/** What the rules that fired say about one pair, gathered. */
export type RuleSummary = {
  relation?: Relation
  modifications: RuleModification[]
  extraParts: (RuleExtraPart & { reason: string })[]
  cautions: Caution[]
  steps: ExplanationStep[]
  ruleIds: string[]
}

/** Summaries by outcome list: the rule book hands out the same cached list for the same values, so each is gathered once. */
const summaries = new WeakMap<readonly RuleOutcome[], RuleSummary>()

/** The rules' outcomes gathered; the answer is shared between callers and frozen, so read it, never change it. */
export function summariseOutcomes(outcomes: RuleOutcome[]): RuleSummary {
  let summary = summaries.get(outcomes)
  if (!summary) {
    summary = gather(outcomes)
    for (const list of [summary.modifications, summary.extraParts, summary.cautions, summary.steps, summary.ruleIds]) Object.freeze(list)
    summaries.set(outcomes, Object.freeze(summary))
  }
  return summary
}

function gather(outcomes: RuleOutcome[]): RuleSummary {
  const summary: RuleSummary = { modifications: [], extraParts: [], cautions: [], steps: [], ruleIds: [] }
  const relations: Relation[] = []
  for (const { ruleId, event, measured } of outcomes) {
    if (!summary.ruleIds.includes(ruleId)) summary.ruleIds.push(ruleId)
    switch (event.type) {
      case 'relation':
        relations.push(event.params.relation)
        summary.steps.push({ type: 'rule', ruleId, relation: event.params.relation, text: event.params.reason })
        break
      case 'modification':
        relations.push('fits-with-modification')
        summary.modifications.push({
          name: event.params.modification,
          reason: event.params.reason,
          extraParts: event.params.extraParts ?? [],
          ruleId,
          ...(measured ? { measured } : {}),
        })
        summary.steps.push({ type: 'rule', ruleId, relation: 'fits-with-modification', text: event.params.reason })
        break
      case 'extra-part':
        summary.extraParts.push(event.params)
        break
      case 'caution':
        summary.cautions.push({ ...event.params, ruleId })
        break
    }
  }
  if (relations.length) summary.relation = worstVerdict(relations) as Relation
  return summary
}
