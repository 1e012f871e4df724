import { isSlotId } from '../../shared/build-template'
import { RELATIONS, type FitGroupPage, type FitResult, type FitsQuery, type FitsResponse } from '../../shared/schemas/fitment'
import type { Part } from '../../shared/schemas/part'
import { chainSteps, loadChainDetails, planChain, type Chain } from './explain'
import type { FitGraph, FitGraphIndex } from './fit-graph'
import { compareGroups, pageByNumber, type GroupKey } from './fit-pages'
import type { Found } from './found'
import type { InferredFits } from './inferred-fits'
import { reviewedFits, type ReviewedFit } from './graph-search'
import type { ModificationService } from '../catalogue/modification.service'
import type { PartService } from '../catalogue/part.service'
import type { LinkEvidence } from '../field-reports/field-report-evidence'
import type { StockIndex } from '../stock/stock-index'

export type { FitsQuery }

type ReviewedGroup = GroupKey & { fits: ReviewedFit[] }
type PageGroup = GroupKey & { total: number; found: Found[] }

export class FitmentService {
  constructor(
    private readonly parts: PartService,
    private readonly graphIndex: FitGraphIndex,
    private readonly inferred: InferredFits,
    private readonly modifications: ModificationService,
    private readonly evidence: { forLinks(linkIds: readonly number[]): Promise<Map<number, LinkEvidence>> },
    private readonly stock: Pick<StockIndex, 'has' | 'of'>,
  ) {}

  /**
   * What else fits a part: its reviewed links (approved, and proposed ones
   * marked as such), the same through every identical part, then fits the
   * rules infer from attributes among parts of mating kinds. Every (kind,
   * relation) group is counted in full and answered one page at a time, so a
   * part with thousands of links answers as fast as one with ten; whole parts,
   * link details and modifications are read for the page only.
   */
  async fitsFor(code: string, query: FitsQuery, homeSiteId: number | null = null): Promise<FitsResponse> {
    const { entity, resolvedFrom } = await this.parts.requireResolved(code)
    const graph = await this.graphIndex.snapshot()
    const members = graph.classOf(entity.id)
    const reviewed = reviewedFits(graph, entity.id)
    const offset = (query.page - 1) * query.pageSize
    const groups: PageGroup[] = []
    const chains = new Map<Found, Chain>()
    const only = query.inStock ? (partId: number) => this.stock.has(partId) : undefined
    for (const group of groupReviewed(graph, reviewed, query, only)) {
      const byTarget = new Map(group.fits.map((fit) => [fit.target, fit]))
      const page = pageByNumber([...byTarget.keys()], (id) => graph.partNumberOf(id), offset, query.pageSize)
      const pageChains = page.map((target) => {
        const fit = byTarget.get(target)!
        return planChain(graph, entity.id, fit.member, graph.linkAt(fit.slot), fit.other, target)
      })
      const found = pageChains.map((chain, index) => {
        const item = reviewedFound(page[index]!, chain)
        chains.set(item, chain)
        return item
      })
      groups.push({ kind: group.kind, relation: group.relation, source: group.source, total: group.fits.length, found })
    }
    if (query.inferred && isSlotId(entity.kind)) {
      const answer = await this.inferred.find(graph, entity.id, entity.kind, new Set([...members, ...reviewed.keys()]), {
        relation: query.relation,
        kind: query.kind,
        offset,
        limit: query.pageSize,
        only,
      })
      for (const { kind, relation, total } of answer.groups) {
        const found = answer.found.filter((item) => item.relation === relation && graph.kindOf(item.partId) === kind)
        groups.push({ kind, relation, source: 'inferred', total, found })
      }
    }
    groups.sort(compareGroups)

    const details = await loadChainDetails(graph, [...chains.values()])
    const evidence = await this.evidence.forLinks([...chains.values()].map((chain) => chain.link.id))
    for (const [found, chain] of chains) {
      found.modificationNames = details.links.get(chain.link.id)?.modifications ?? []
      found.explanation = chainSteps(graph, chain, details)
    }
    const identical = members.filter((id) => id !== entity.id)
    const shown = groups.flatMap((group) => group.found)
    const partList = await this.parts.byIds([entity.id, ...identical, ...shown.map((found) => found.partId)])
    const byNumber = new Map(partList.map((part) => [part.partNumber, part]))
    const partOf = (id: number): Part | undefined => byNumber.get(graph.partNumberOf(id))
    const mods = await this.modifications.byNames(shown.flatMap((found) => found.modificationNames))
    const toResult = (found: Found): FitResult[] => {
      const part = partOf(found.partId)
      // A part removed between the count and this read is left out rather than shown half.
      if (!part) return []
      return [
        {
          part,
          relation: found.relation,
          decidedBy: found.decidedBy,
          review: found.review,
          ruleIds: found.ruleIds,
          modifications: found.modificationNames.flatMap((name) => mods.get(name) ?? []),
          explanation: found.explanation,
          fieldReports: evidence.get(chains.get(found)?.link.id ?? -1) ?? { confirmed: 0, contradicted: 0 },
          ...linkPartsOf(graph, chains.get(found)),
          stock: this.stock.of(found.partId, homeSiteId),
        },
      ]
    }
    return {
      part: byNumber.get(entity.partNumber)!,
      resolvedFrom,
      identical: identical.flatMap((id) => partOf(id) ?? []),
      page: query.page,
      pageSize: query.pageSize,
      groups: groups.map((group): FitGroupPage => ({
        kind: group.kind,
        relation: group.relation,
        source: group.source,
        total: group.total,
        offset,
        results: group.found.flatMap(toResult),
      })),
    }
  }
}

/** Reviewed fits by kind and relation, under the query's filters. */
function groupReviewed(
  graph: FitGraph,
  reviewed: Map<number, ReviewedFit>,
  query: Pick<FitsQuery, 'kind' | 'relation'>,
  only?: (partId: number) => boolean,
): ReviewedGroup[] {
  const groups = new Map<string, ReviewedGroup>()
  for (const fit of reviewed.values()) {
    const kind = graph.kindOf(fit.target)
    const relation = RELATIONS[graph.links.relation[fit.slot]!]!
    if ((query.kind && kind !== query.kind) || (query.relation && relation !== query.relation)) continue
    if (only && !only(fit.target)) continue
    const key = `${kind}|${relation}`
    let group = groups.get(key)
    if (!group) groups.set(key, (group = { kind, relation, source: 'reviewed', fits: [] }))
    group.fits.push(fit)
  }
  return [...groups.values()]
}

/** A reviewed answer; its modifications and explanation follow once the page's link details are read. */
function reviewedFound(target: number, chain: Chain): Found {
  return {
    partId: target,
    relation: chain.link.relation,
    decidedBy: 'link',
    review: chain.link.status === 'approved' ? 'approved' : 'proposed',
    ruleIds: [],
    modificationNames: [],
    explanation: [],
  }
}

/** The deciding link's two part numbers, for its field reports. */
function linkPartsOf(graph: FitGraph, chain: Chain | undefined): { linkParts?: [string, string] } {
  return chain ? { linkParts: [graph.partNumberOf(chain.link.a), graph.partNumberOf(chain.link.b)] } : {}
}
