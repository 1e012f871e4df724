import { BUILD_SLOTS, isSlotId } from '../../shared/build-template'
import {
  RELATIONS,
  type ExplanationStep,
  type FitResult,
  type FitsResponse,
  type Relation,
} from '../../shared/schemas/fitment'
import type { PartKind } from '../../shared/schemas/part-kinds'
import { chainSteps } from './explain'
import type { FitGraph, FitGraphIndex } from './fit-graph'
import type { Found } from './found'
import type { InferredFits } from './inferred-fits'
import { reviewedFits } from './graph-search'
import type { ModificationService } from '../catalogue/modification.service'
import type { PartService } from '../catalogue/part.service'

const KIND_ORDER = new Map<string, number>(BUILD_SLOTS.map((slot, index) => [slot.id, index]))
const REVIEW_ORDER = { approved: 0, proposed: 1, inferred: 2 }

export type FitsQuery = { relation?: Relation; kind?: PartKind; inferred: boolean; inferredLimit: number }

export class FitmentService {
  constructor(
    private readonly parts: PartService,
    private readonly graphIndex: FitGraphIndex,
    private readonly inferred: InferredFits,
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
      ? await this.inferred.find(entity.kind, entity.attributes, entity.yearTo, new Set([...members, ...reviewed.keys()]), {
          relation: query.relation,
          kind: query.kind,
          offset: 0,
          limit: query.inferredLimit,
        })
      : { found: [], groups: [] }
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
      truncated: inferred.groups
        .filter((group) => group.total > query.inferredLimit)
        .map((group) => ({ ...group, shown: query.inferredLimit })),
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
}
