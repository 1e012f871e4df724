import type { DataSource } from 'typeorm'
import { BUILD_SLOTS, isSlotId, matingSlots, type SlotId } from '../../shared/build-template'
import {
  RELATIONS,
  type ExplanationStep,
  type FitResult,
  type FitsResponse,
  type Relation,
} from '../../shared/schemas/fitment'
import type { PartAttributes } from '../../shared/schemas/part-attributes'
import type { PartKind } from '../../shared/schemas/part-kinds'
import { chainSteps } from './explain'
import { buildFacts } from '../reasoning/facts'
import { computeFigures } from '../reasoning/figures'
import { summariseOutcomes, type RuleSummary } from '../reasoning/rule-summary'
import type { RuleBook } from '../reasoning/rule-book'
import type { FitGraph, FitGraphIndex } from './fit-graph'
import { reviewedFits } from './graph-search'
import type { ModificationService } from '../catalogue/modification.service'
import type { PartService } from '../catalogue/part.service'

type Found = {
  partId: number
  relation: Relation
  decidedBy: 'link' | 'rule'
  review: 'approved' | 'proposed' | 'inferred'
  ruleIds: string[]
  modificationNames: string[]
  explanation: ExplanationStep[]
}

type RuleCandidate = { id: number; kind: PartKind; attributes: string; yearTo: number | null }

const KIND_ORDER = new Map<string, number>(BUILD_SLOTS.map((slot, index) => [slot.id, index]))
const REVIEW_ORDER = { approved: 0, proposed: 1, inferred: 2 }

export type FitsQuery = { relation?: Relation; kind?: PartKind; inferred: boolean; inferredLimit: number }
type Truncated = FitsResponse['truncated']

export class FitmentService {
  constructor(
    private readonly dataSource: DataSource,
    private readonly parts: PartService,
    private readonly graphIndex: FitGraphIndex,
    private readonly rules: RuleBook,
    private readonly modifications: ModificationService,
  ) {}

  /**
   * What else fits a part: its reviewed links (approved, and proposed ones
   * marked as such), the same through every identical part, then fits the
   * rules infer from attributes among parts of mating kinds.
   */
  async fitsFor(code: string, query: FitsQuery): Promise<FitsResponse> {
    const entity = await this.parts.requireEntity(code)
    const graph = await this.graphIndex.snapshot()
    const members = graph.classOf(entity.id)
    const reviewed = this.reviewedFits(graph, entity.id)
    const inferred = query.inferred && isSlotId(entity.kind)
      ? await this.inferredFits(entity.kind, entity.attributes, entity.yearTo, new Set([...members, ...reviewed.keys()]), query)
      : { found: [], truncated: [] }
    const all = [...reviewed.values(), ...inferred.found].filter(
      (found) =>
        (!query.relation || found.relation === query.relation) &&
        (!query.kind || graph.part(found.partId).kind === query.kind),
    )
    all.sort((a, b) => this.compare(graph, a, b))
    const ids = [entity.id, ...members.filter((id) => id !== entity.id), ...all.map((found) => found.partId)]
    const partList = await this.parts.byIds(ids)
    const byNumber = new Map(partList.map((part) => [part.partNumber, part]))
    const mods = await this.modifications.byNames(all.flatMap((found) => found.modificationNames))
    const results: FitResult[] = all.map((found) => ({
      part: byNumber.get(graph.part(found.partId).partNumber)!,
      relation: found.relation,
      decidedBy: found.decidedBy,
      review: found.review,
      ruleIds: found.ruleIds,
      modifications: found.modificationNames.map((name) => mods.get(name)!),
      explanation: found.explanation,
    }))
    return {
      part: byNumber.get(entity.partNumber)!,
      identical: members.filter((id) => id !== entity.id).map((id) => byNumber.get(graph.part(id).partNumber)!),
      results,
      truncated: inferred.truncated,
    }
  }

  private compare(graph: FitGraph, a: Found, b: Found): number {
    const partA = graph.part(a.partId)
    const partB = graph.part(b.partId)
    return (
      Number(a.review === 'inferred') - Number(b.review === 'inferred') ||
      (KIND_ORDER.get(partA.kind) ?? 99) - (KIND_ORDER.get(partB.kind) ?? 99) ||
      RELATIONS.indexOf(a.relation) - RELATIONS.indexOf(b.relation) ||
      REVIEW_ORDER[a.review] - REVIEW_ORDER[b.review] ||
      partA.partNumber.localeCompare(partB.partNumber)
    )
  }

  private reviewedFits(graph: FitGraph, partId: number): Map<number, Found> {
    const found = new Map<number, Found>()
    for (const { target, link, member, other } of reviewedFits(graph, partId).values()) {
      found.set(target, {
        partId: target,
        relation: link.relation,
        decidedBy: 'link',
        review: link.status === 'approved' ? 'approved' : 'proposed',
        ruleIds: [],
        modificationNames: link.modifications,
        explanation: chainSteps(graph, partId, member, link, other, target),
      })
    }
    return found
  }

  /**
   * Parts of mating kinds whose pair the rules decide from attributes alone,
   * at most `inferredLimit` per kind and relation. Parts with the same
   * attributes get the same answer, so each distinct set is judged once.
   */
  private async inferredFits(
    kind: SlotId,
    attributes: PartAttributes,
    yearTo: number | null,
    exclude: Set<number>,
    query: FitsQuery,
  ): Promise<{ found: Found[]; truncated: Truncated }> {
    const kinds = matingSlots(kind).filter((other) => this.rules.hasPairRules(kind, other) && (!query.kind || query.kind === other))
    if (kinds.length === 0) return { found: [], truncated: [] }
    const candidates = (await this.dataSource.query(
      `SELECT id, kind, attributes, yearTo FROM part WHERE kind IN (${kinds.map(() => '?').join(',')}) ORDER BY partNumber`,
      kinds,
    )) as RuleCandidate[]
    const self = { attributes, yearTo }
    const judged = new Map<string, RuleSummary>()
    const counts = new Map<string, number>()
    const found: Found[] = []
    for (const candidate of candidates) {
      if (exclude.has(candidate.id)) continue
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
      if (count > query.inferredLimit) continue
      found.push({
        partId: candidate.id,
        relation: summary.relation,
        decidedBy: 'rule',
        review: 'inferred',
        ruleIds: summary.ruleIds,
        modificationNames: [...new Set(summary.modifications.map((m) => m.name))],
        explanation: [
          ...summary.steps,
          ...summary.cautions.map((caution): ExplanationStep => ({ type: 'note', text: caution.text, ruleId: caution.ruleId })),
        ],
      })
    }
    const truncated = [...counts]
      .filter(([, total]) => total > query.inferredLimit)
      .map(([key, total]) => {
        const [otherKind, relation] = key.split('|') as [SlotId, Relation]
        return { kind: otherKind, relation, shown: query.inferredLimit, total }
      })
    return { found, truncated }
  }
}
