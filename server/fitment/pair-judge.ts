import type { PairJudgement } from '../../shared/schemas/build'
import type { ExplanationStep, Verdict } from '../../shared/schemas/fitment'
import type { FitGraph } from './fit-graph'
import { chainSteps, loadChainDetails, planChain, RELATION_WORDS } from './explain'
import type { Facts, RuleBook } from '../reasoning/rule-book'
import { summariseOutcomes, type RuleSummary } from '../reasoning/rule-summary'
import { decidingReason, orderEvidence } from './deciding-reason'

/** `linkId` is the deciding link's, for its field-report evidence; it stays on the server. */
export type JudgedPair = PairJudgement & { rules: RuleSummary; linkModifications: string[]; linkId?: number }

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
  const partNumbers: [string, string] = [graph.partNumberOf(idA), graph.partNumberOf(idB)]
  const outcomes = await rules.evaluatePair(input.slots[0], input.slots[1], input.facts)
  const summary = summariseOutcomes(outcomes)
  const found = graph.linkBetween(idA, idB)
  if (found) {
    const chain = planChain(graph, idA, found.viaA, found.link, found.viaB, idB)
    const details = await loadChainDetails(graph, [chain])
    const linked = details.links.get(found.link.id)?.modifications ?? []
    // The link knows the parts; this engine's measured faces can still call for machining on top.
    const measured =
      found.link.relation === 'does-not-fit' ? [] : summary.modifications.filter((m) => m.measured && !linked.includes(m.name))
    const modifications = [...new Set([...linked, ...measured.map((m) => m.name)])]
    const relation = measured.length ? 'fits-with-modification' : found.link.relation
    const explanation = chainSteps(graph, chain, details)
    const ruleSteps = orderEvidence(summary.steps, relation)
    const partRules = summariseOutcomes(outcomes.filter((outcome) => !outcome.measured))
    if (partRules.relation && partRules.relation !== found.link.relation) {
      explanation.push({
        type: 'note',
        text: `The rules alone would say "${RELATION_WORDS[partRules.relation]}" (${partRules.ruleIds.join(', ')}); the reviewed link decides.`,
      })
    }
    explanation.push(...ruleSteps)
    const fromRules = summary.modifications.filter((m) => modifications.includes(m.name)).map((m) => m.reason)
    return {
      slots: input.slots,
      label: input.label,
      partNumbers,
      relation,
      decidedBy: 'link',
      reason: decidingReason(relation, 'link', explanation, fromRules),
      ruleIds: summary.ruleIds,
      modifications,
      explanation,
      fieldReports: { confirmed: 0, contradicted: 0 },
      linkParts: [graph.partNumberOf(found.link.a), graph.partNumberOf(found.link.b)],
      rules: summary,
      linkModifications: modifications,
      linkId: found.link.id,
    }
  }
  const relation: Verdict = summary.relation ?? 'unknown'
  const explanation: ExplanationStep[] = summary.relation
    ? orderEvidence(summary.steps, summary.relation)
    : [{ type: 'note', text: `No reviewed link and no rule decides ${partNumbers[0]} with ${partNumbers[1]}: no evidence is not a fit.` }]
  return {
    slots: input.slots,
    label: input.label,
    partNumbers,
    relation,
    decidedBy: summary.relation ? 'rule' : 'none',
    reason: decidingReason(
      relation,
      summary.relation ? 'rule' : 'none',
      explanation,
      summary.modifications.map((m) => m.reason),
    ),
    ruleIds: summary.ruleIds,
    modifications: summary.modifications.map((m) => m.name),
    explanation,
    rules: summary,
    fieldReports: { confirmed: 0, contradicted: 0 },
    linkModifications: [],
  }
}
