import type { Caution, PairJudgement } from '../../shared/schemas/build'
import { worstVerdict, type ExplanationStep, type Relation, type Verdict } from '../../shared/schemas/fitment'
import type { FitGraph } from '../services/fit-graph'
import { chainSteps, RELATION_WORDS } from './explain'
import type { Facts, RuleBook, RuleOutcome } from './rule-book'
import type { RuleExtraPart } from './rule-file.schema'

export type RuleModification = { name: string; reason: string; extraParts: RuleExtraPart[]; ruleId: string }

/** What the rules that fired say about one pair, gathered. */
export type RuleSummary = {
  relation?: Relation
  modifications: RuleModification[]
  extraParts: (RuleExtraPart & { reason: string })[]
  cautions: Caution[]
  steps: ExplanationStep[]
  ruleIds: string[]
}

export function summariseOutcomes(outcomes: RuleOutcome[]): RuleSummary {
  const summary: RuleSummary = { modifications: [], extraParts: [], cautions: [], steps: [], ruleIds: [] }
  const relations: Relation[] = []
  for (const { ruleId, event } of outcomes) {
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

export type JudgedPair = PairJudgement & { rules: RuleSummary; linkModifications: string[] }

/**
 * Judges one filled mating pair: a reviewed link (looking through identical
 * parts) outranks the rules; with neither, the pair is unknown, never a fit.
 */
export async function judgePair(
  graph: FitGraph,
  rules: RuleBook,
  input: { slots: [string, string]; label: string; partIds: [number, number]; facts: Facts },
): Promise<JudgedPair> {
  const [idA, idB] = input.partIds
  const partNumbers: [string, string] = [graph.part(idA).partNumber, graph.part(idB).partNumber]
  const summary = summariseOutcomes(await rules.evaluatePair(input.slots[0], input.slots[1], input.facts))
  const found = graph.linkBetween(idA, idB)
  if (found) {
    const explanation = chainSteps(graph, idA, found.viaA, found.link, found.viaB, idB)
    if (summary.relation && summary.relation !== found.link.relation) {
      explanation.push({
        type: 'note',
        text: `The rules alone would say "${RELATION_WORDS[summary.relation]}" (${summary.ruleIds.join(', ')}); the reviewed link decides.`,
      })
    }
    return {
      slots: input.slots,
      label: input.label,
      partNumbers,
      relation: found.link.relation,
      decidedBy: 'link',
      ruleIds: summary.ruleIds,
      modifications: found.link.modifications,
      explanation,
      rules: summary,
      linkModifications: found.link.modifications,
    }
  }
  const relation: Verdict = summary.relation ?? 'unknown'
  const explanation: ExplanationStep[] = summary.relation
    ? summary.steps
    : [{ type: 'note', text: `No reviewed link and no rule decides ${partNumbers[0]} with ${partNumbers[1]}: no evidence is not a fit.` }]
  return {
    slots: input.slots,
    label: input.label,
    partNumbers,
    relation,
    decidedBy: summary.relation ? 'rule' : 'none',
    ruleIds: summary.ruleIds,
    modifications: summary.modifications.map((m) => m.name),
    explanation,
    rules: summary,
    linkModifications: [],
  }
}
