import { BUILD_SLOTS, isSlotId, matingSlots, type SlotId } from '../../shared/build-template'
import { AppError } from '../errors/app-error'
import type { Candidate, Completion } from '../../shared/schemas/build'
import { SKILL_LEVELS, worstVerdict, type Relation } from '../../shared/schemas/fitment'
import type { BuildEvaluationService, ResolvedBuild } from './build-evaluation.service'
import type { FitGraph, FitGraphIndex } from '../fitment/fit-graph'
import type { ModificationService } from '../catalogue/modification.service'
import type { PartService } from '../catalogue/part.service'
import { candidatePreference, type Preference } from './candidate-preference'
import type { Caution } from '../../shared/schemas/build'
import type { StockIndex } from '../stock/stock-index'
import { JudgementCache, type CandidateReads } from './judgement-cache'
import { SlotTrials } from './slot-trials'

/** A candidate as the fit graph holds it: its id, number and rule class (attributes and last year). */
type Row = { id: number; partNumber: string; ruleClass: number }

/** Reads one request can share across many completions (fill the gaps asks dozens): the skill of a modification. */
export class CompletionReads {
  private readonly skills = new Map<string, Promise<number>>()

  constructor(private readonly modifications: ModificationService) {}

  /** Harder work weighs more, so the easiest way to a working build comes first. */
  skillWeight(name: string): Promise<number> {
    let weight = this.skills.get(name)
    if (!weight) {
      weight = this.modifications.byNames([name]).then((found) => SKILL_WEIGHT[found.get(name)!.skillLevel] ?? 2)
      this.skills.set(name, weight)
    }
    return weight
  }
}

const SKILL_WEIGHT = Object.fromEntries(SKILL_LEVELS.map((level, index) => [level, index + 1])) as Record<string, number>

export class BuildCompletionService {
  constructor(
    private readonly parts: PartService,
    private readonly graphIndex: FitGraphIndex,
    private readonly evaluation: BuildEvaluationService,
    private readonly modifications: ModificationService,
    private readonly stock: Pick<StockIndex, 'of'>,
  ) {}

  /**
   * For each empty slot: parts that fit every filled slot they mate with
   * (directly or with modification), fewest and easiest modifications first.
   */
  async complete(
    request: Parameters<BuildEvaluationService['resolve']>[0],
    limit: number,
    only?: string[],
    homeSiteId: number | null = null,
  ): Promise<Completion> {
    const unknown = (only ?? []).filter((slot) => !isSlotId(slot))
    if (unknown.length) {
      throw AppError.badRequest(
        `Unknown slot ${unknown.join(', ')}.`,
        unknown.map((slot) => ({ path: 'only', message: `Unknown slot "${slot}".` })),
      )
    }
    const build = await this.evaluation.resolve(request)
    return this.completeBuild(build, await this.graphIndex.snapshot(), limit, { only: only?.filter(isSlotId), homeSiteId })
  }

  /** A fresh set of shared reads, for one request. */
  reads(): CompletionReads {
    return new CompletionReads(this.modifications)
  }

  /**
   * Candidates for the empty slots of a resolved build (only those in `only`, when given).
   * `firstFound` stops each slot at the first part that fits, for callers that ask only whether one does.
   */
  async completeBuild(
    build: ResolvedBuild,
    graph: FitGraph,
    limit: number,
    {
      only,
      reads = this.reads(),
      homeSiteId = null,
      firstFound = false,
    }: { only?: SlotId[]; reads?: CompletionReads; homeSiteId?: number | null; firstFound?: boolean } = {},
  ): Promise<Completion> {
    const result: Completion = { slots: {} }
    for (const slot of BUILD_SLOTS) {
      if (build.parts[slot.id] || (only && !only.includes(slot.id))) continue
      const matesWith = matingSlots(slot.id).filter((other) => build.parts[other])
      if (matesWith.length === 0) {
        result.slots[slot.id] = {
          matesWith,
          candidates: [],
          note: `Choose a part for a slot it mates with first (${matingSlots(slot.id).join(', ')}).`,
        }
        continue
      }
      const { candidates, total } = await this.candidatesFor(slot.id, build, graph, reads, firstFound ? 1 : limit, homeSiteId, firstFound)
      result.slots[slot.id] = {
        matesWith,
        candidates,
        note: total === 0 ? `No catalogue part fits every chosen part it mates with (${matesWith.join(', ')}).` : undefined,
      }
    }
    return result
  }

  /**
   * A candidate in the slot against every filled slot it mates with; null unless all fit.
   * With `reads`, the candidate's number is read through it too (see JudgementCache).
   */
  private async judge(
    trials: SlotTrials,
    id: number,
    part: CandidateReads['part'],
    graph: FitGraph,
    { baseline, linked, reads }: { baseline: Caution[]; linked: boolean; reads?: CandidateReads },
  ) {
    const { slot } = trials
    const { build: trial, facts } = trials.trial(id, part, reads)
    // Without a reviewed link the rules decide every pair, and most candidates fail one: screen before explaining.
    if (!linked && (await this.evaluation.rulesRuleOut(trial, facts, slot))) return null
    const pairs = await this.evaluation.judgePairs(graph, trial, facts, slot)
    if (pairs.some((pair) => pair.relation === 'does-not-fit' || pair.relation === 'unknown')) return null
    const preference = candidatePreference(await this.evaluation.buildCautions(facts), baseline)
    return {
      preference,
      relation: worstVerdict(pairs.map((pair) => pair.relation)) as Relation,
      modifications: [...new Set(pairs.flatMap((pair) => pair.modifications))],
      reasons: [...preference.notes, ...pairs.map((pair) => `${pair.label}: ${pair.reason}`)],
      byRule: pairs.some((pair) => pair.decidedBy === 'rule'),
    }
  }

  /** The best `limit` candidates for a slot, fewest and easiest modifications first, and how many fit in all. */
  private async candidatesFor(
    slot: SlotId,
    build: ResolvedBuild,
    graph: FitGraph,
    reads: CompletionReads,
    limit: number,
    homeSiteId: number | null,
    firstFound: boolean,
  ) {
    // Every part of the slot's kind, in part-number order, from the graph rather than the part table.
    const rows: Row[] = graph
      .partsOfKind(slot)
      .map((id) => ({ id, partNumber: graph.partNumberOf(id), ruleClass: graph.ruleClasses.classOf(id) }))
    type Judgement = { relation: Relation; modifications: string[]; reasons: string[]; byRule: boolean; preference: Preference } | null
    // The build's own cautions without the candidate: only what a candidate adds counts against it.
    const baseline = await this.evaluation.buildCautions(this.evaluation.prepare(build, graph).facts)
    const accepted: ({ row: Row } & NonNullable<Judgement>)[] = []
    const neighbourIds = matingSlots(slot).flatMap((other) => (build.ids[other] === undefined ? [] : [build.ids[other]!]))
    const linkedToNeighbours = graph.linkedWith(neighbourIds)
    // Without a reviewed link the rules decide, and parts that agree on what the rules read get the same answer.
    const unlinked = new JudgementCache<Judgement>()
    const trials = new SlotTrials(build, slot, graph)
    for (const row of rows) {
      const input = { partNumber: row.partNumber, ...graph.ruleClasses.input(row.ruleClass) }
      const judgement = linkedToNeighbours.has(row.id)
        ? await this.judge(trials, row.id, input, graph, { baseline, linked: true })
        : await unlinked.judge(input, (part, reads) => this.judge(trials, row.id, part, graph, { baseline, linked: false, reads }))
      if (judgement) accepted.push({ row, ...judgement })
      if (judgement && firstFound) break
    }
    const scored = await Promise.all(
      accepted.map(async (a) => {
        // Legal and safe first, then reviewed evidence before inference among otherwise equal candidates.
        let score = a.preference.penalty + (a.byRule ? 0.1 : 0)
        for (const name of a.modifications) score += 1 + (await reads.skillWeight(name))
        return { ...a, score }
      }),
    )
    scored.sort((a, b) => a.score - b.score || a.row.partNumber.localeCompare(b.row.partNumber))
    const best = scored.slice(0, limit)
    const full = new Map((await this.parts.byIds(best.map((a) => a.row.id))).map((part) => [part.partNumber, part]))
    const candidates = best.map((a): Candidate => ({
      part: full.get(a.row.partNumber)!,
      relation: a.relation,
      modifications: a.modifications,
      score: a.score,
      reasons: a.reasons,
      setBackFor: a.preference.notes,
      stock: this.stock.of(a.row.id, homeSiteId),
    }))
    return { candidates, total: scored.length }
  }
}
