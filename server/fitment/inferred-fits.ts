import { matingSlots, type SlotId } from '../../shared/build-template'
import type { ExplanationStep, Relation } from '../../shared/schemas/fitment'
import type { PartKind } from '../../shared/schemas/part-kinds'
import { buildFacts } from '../reasoning/facts'
import { computeFigures } from '../reasoning/figure-facts'
import type { RuleBook, RuleOutcome } from '../reasoning/rule-book'
import { summariseOutcomes, type RuleSummary } from '../reasoning/rule-summary'
import type { Found } from './found'
import type { FitGraph } from './graph/fit-graph'
import { orderEvidence } from './deciding-reason'
import { companionsRevision, findCompanions } from './companions'

/** One page of each (kind, relation) group: the items at [offset, offset + limit) in part-number order. */
export type InferredQuery = { relation?: Relation; kind?: PartKind; offset: number; limit: number; only?: (partId: number) => boolean }
/** The page's answers, and every group's honest total (parts in `exclude` never count). */
export type InferredAnswer = { found: Found[]; groups: { kind: SlotId; relation: Relation; total: number }[] }

/** Judgements kept across requests, by the two rule classes: enough for every pair a busy counter asks about. */
const JUDGED_LIMIT = 200_000
/** Sides whose decided parts are kept (a list of part ids each). */
const DECIDED_LIMIT = 2_000

type Decided = { graph: FitGraph; revision: number; parts: number[]; summaries: RuleSummary[] }

/** Fits the rules infer from attributes, among the parts of the kinds a part mates with. */
export class InferredFits {
  /**
   * Judgements by the part's side (its kind, class and the other kind), then the other part's class.
   * The rules are fixed while the server runs and a class id is never reused, so a judgement stays true;
   * a head and distributor pair also reads the housings and adapter plates in the catalogue, so its side
   * is keyed by their revision too.
   */
  private readonly judged = new Map<string, Map<number, RuleSummary>>()
  private judgedCount = 0
  /** Per side, the parts the rules decide, so a request walks those rather than every part of the kind. */
  private readonly decided = new Map<string, Decided>()

  constructor(private readonly rules: RuleBook) {}

  /**
   * Parts of mating kinds whose pair the rules decide from attributes alone,
   * one page per kind and relation. Parts of one rule class (the same
   * attributes and last year) get the same answer, so each class is judged
   * once; the parts come from the fit graph, never from the part table.
   */
  async find(graph: FitGraph, partId: number, kind: SlotId, exclude: Set<number>, query: InferredQuery): Promise<InferredAnswer> {
    const kinds = matingSlots(kind).filter((other) => this.rules.hasPairRules(kind, other) && (!query.kind || query.kind === other))
    const classes = graph.ruleClasses
    const selfClass = classes.classOf(partId)
    if (kinds.length === 0 || selfClass < 0) return { found: [], groups: [] }
    const found: Found[] = []
    const groups: InferredAnswer['groups'] = []
    for (const otherKind of kinds) {
      const counts = new Map<Relation, number>()
      const decided = await this.decidedFor(graph, kind, selfClass, otherKind)
      for (let i = 0; i < decided.parts.length; i++) {
        const candidate = decided.parts[i]!
        if (exclude.has(candidate) || (query.only && !query.only(candidate))) continue
        const summary = decided.summaries[i]!
        const relation = summary.relation!
        if (query.relation && relation !== query.relation) continue
        const count = (counts.get(relation) ?? 0) + 1
        counts.set(relation, count)
        if (count <= query.offset || count > query.offset + query.limit) continue
        found.push(inferredFound(candidate, relation, summary))
      }
      for (const [relation, total] of counts) groups.push({ kind: otherKind, relation, total })
    }
    return { found, groups }
  }

  /**
   * The parts of `otherKind` in part-number order whose pair with the class the
   * rules decide, with the rules' summary: one pass over the kind, kept until
   * a part of that kind changes (its revision) or the graph is reloaded.
   */
  private async decidedFor(graph: FitGraph, kind: SlotId, selfClass: number, otherKind: SlotId): Promise<Decided> {
    const key = this.keyOf(graph, kind, selfClass, otherKind)
    const revision = graph.revisionOfKind(otherKind)
    const known = this.decided.get(key)
    if (known && known.graph === graph && known.revision === revision) return known
    const side = this.sideOf(key)
    const classes = graph.ruleClasses
    const decided: Decided = { graph, revision, parts: [], summaries: [] }
    for (const candidate of graph.partsOfKind(otherKind)) {
      const otherClass = classes.classOf(candidate)
      // Most candidates share a class judged before: no promise for those.
      let summary = side.get(otherClass) ?? this.judge(graph, side, kind, selfClass, otherKind, otherClass)
      if (summary instanceof Promise) summary = await summary
      if (!summary.relation) continue
      decided.parts.push(candidate)
      decided.summaries.push(summary)
    }
    if (this.decided.size >= DECIDED_LIMIT) this.decided.clear()
    this.decided.set(key, decided)
    return decided
  }

  private keyOf(graph: FitGraph, kind: SlotId, selfClass: number, otherKind: SlotId): string {
    const readsCompanions = (kind === 'head' && otherKind === 'distributor') || (kind === 'distributor' && otherKind === 'head')
    return `${kind}:${selfClass}|${otherKind}${readsCompanions ? `@${companionsRevision(graph)}` : ''}`
  }

  private sideOf(key: string): Map<number, RuleSummary> {
    let side = this.judged.get(key)
    if (!side) {
      side = new Map()
      this.judged.set(key, side)
    }
    return side
  }

  /** A class judged and kept: at once when the rule book has these values, a promise only when the rules must run. */
  private judge(
    graph: FitGraph,
    side: Map<number, RuleSummary>,
    kind: SlotId,
    selfClass: number,
    otherKind: SlotId,
    otherClass: number,
  ): RuleSummary | Promise<RuleSummary> {
    const outcomes = this.rules.pairOutcomes(kind, otherKind, this.factsOf(graph, kind, selfClass, otherKind, otherClass))
    const kept = (found: RuleOutcome[]) => this.keep(side, otherClass, summariseOutcomes(found))
    return Array.isArray(outcomes) ? kept(outcomes) : outcomes.then(kept)
  }

  private factsOf(graph: FitGraph, kind: SlotId, selfClass: number, otherKind: SlotId, otherClass: number) {
    const classes = graph.ruleClasses
    const slotParts = { [kind]: classes.input(selfClass), [otherKind]: classes.input(otherClass) }
    return buildFacts(
      slotParts,
      computeFigures(slotParts, {}, () => findCompanions(graph, slotParts)),
      {},
    )
  }

  private keep(side: Map<number, RuleSummary>, otherClass: number, summary: RuleSummary): RuleSummary {
    if (this.judgedCount >= JUDGED_LIMIT) {
      this.judged.clear()
      this.judgedCount = 0
    }
    side.set(otherClass, summary)
    this.judgedCount += 1
    return summary
  }
}

function inferredFound(partId: number, relation: Relation, summary: RuleSummary): Found {
  return {
    partId,
    relation,
    decidedBy: 'rule',
    review: 'inferred',
    ruleIds: summary.ruleIds,
    modificationNames: [...new Set(summary.modifications.map((m) => m.name))],
    explanation: [
      ...orderEvidence(summary.steps, relation),
      ...summary.cautions.map((caution): ExplanationStep => ({
        type: 'note',
        text: caution.text,
        ruleId: caution.ruleId,
        ...(caution.manual ? { manual: caution.manual } : {}),
      })),
    ],
  }
}
