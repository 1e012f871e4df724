import type { DataSource } from 'typeorm'
import { matingSlots, type SlotId } from '../../shared/build-template'
import type { ExplanationStep, Relation } from '../../shared/schemas/fitment'
import type { PartAttributes } from '../../shared/schemas/part-attributes'
import type { PartKind } from '../../shared/schemas/part-kinds'
import { buildFacts } from '../reasoning/facts'
import { computeFigures } from '../reasoning/figures'
import type { RuleBook } from '../reasoning/rule-book'
import { summariseOutcomes, type RuleSummary } from '../reasoning/rule-summary'
import type { Found } from './found'
import { orderEvidence } from './deciding-reason'

type RuleCandidate = { id: number; kind: PartKind; attributes: string; yearTo: number | null }
/** One page of each (kind, relation) group: the items at [offset, offset + limit) in part-number order. */
export type InferredQuery = { relation?: Relation; kind?: PartKind; offset: number; limit: number; only?: (partId: number) => boolean }
/** The page's answers, and every group's honest total (parts in `exclude` never count). */
export type InferredAnswer = { found: Found[]; groups: { kind: SlotId; relation: Relation; total: number }[] }

/** Fits the rules infer from attributes, among the parts of the kinds a part mates with. */
export class InferredFits {
  constructor(
    private readonly dataSource: DataSource,
    private readonly rules: RuleBook,
  ) {}

  /**
   * Parts of mating kinds whose pair the rules decide from attributes alone,
   * one page per kind and relation. Parts with the same
   * attributes get the same answer, so each distinct set is judged once.
   */
  async find(
    kind: SlotId,
    attributes: PartAttributes,
    yearTo: number | null,
    exclude: Set<number>,
    query: InferredQuery,
  ): Promise<InferredAnswer> {
    const kinds = matingSlots(kind).filter((other) => this.rules.hasPairRules(kind, other) && (!query.kind || query.kind === other))
    if (kinds.length === 0) return { found: [], groups: [] }
    const candidates = (await this.dataSource.query(
      `SELECT id, kind, attributes, yearTo FROM part WHERE kind IN (${kinds.map(() => '?').join(',')}) ORDER BY partNumber`,
      kinds,
    )) as RuleCandidate[]
    const self = { attributes, yearTo }
    const judged = new Map<string, RuleSummary>()
    const counts = new Map<string, number>()
    const found: Found[] = []
    for (const candidate of candidates) {
      if (exclude.has(candidate.id) || (query.only && !query.only(candidate.id))) continue
      const otherKind = candidate.kind as SlotId
      const memoKey = `${otherKind}|${candidate.yearTo}|${candidate.attributes}`
      let summary = judged.get(memoKey)
      if (!summary) {
        const other = { attributes: JSON.parse(candidate.attributes) as PartAttributes, yearTo: candidate.yearTo }
        const slotParts = { [kind]: self, [otherKind]: other }
        summary = summariseOutcomes(await this.rules.evaluatePair(kind, otherKind, buildFacts(slotParts, computeFigures(slotParts), {})))
        judged.set(memoKey, summary)
      }
      if (!summary.relation || (query.relation && summary.relation !== query.relation)) continue
      const countKey = `${otherKind}|${summary.relation}`
      const count = (counts.get(countKey) ?? 0) + 1
      counts.set(countKey, count)
      if (count <= query.offset || count > query.offset + query.limit) continue
      found.push({
        partId: candidate.id,
        relation: summary.relation,
        decidedBy: 'rule',
        review: 'inferred',
        ruleIds: summary.ruleIds,
        modificationNames: [...new Set(summary.modifications.map((m) => m.name))],
        explanation: [
          ...orderEvidence(summary.steps, summary.relation),
          ...summary.cautions.map((caution): ExplanationStep => ({ type: 'note', text: caution.text, ruleId: caution.ruleId })),
        ],
      })
    }
    const groups = [...counts].map(([key, total]) => {
      const [otherKind, relation] = key.split('|') as [SlotId, Relation]
      return { kind: otherKind, relation, total }
    })
    return { found, groups }
  }
}
