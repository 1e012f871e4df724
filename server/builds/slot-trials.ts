import type { SlotId } from '../../shared/build-template'
import type { Part } from '../../shared/schemas/part'
import { findCompanions } from '../fitment/companions'
import type { FitGraph } from '../fitment/fit-graph'
import { buildFacts } from '../reasoning/facts'
import { computeFigures } from '../reasoning/figure-facts'
import type { FigureFacts } from '../reasoning/figures'
import type { Facts } from '../reasoning/rule-book'
import type { ResolvedBuild } from './build-evaluation.service'
import type { CandidateReads } from './judgement-cache'

type CandidatePart = CandidateReads['part']

/**
 * Builds that differ from one resolved build in one slot, ready to judge:
 * the rest of the build's facts and part numbers are gathered once, so each
 * of a slot's thousands of candidates costs its own figures and little else.
 * A trial's facts are the ones BuildEvaluationService.prepare makes for it.
 *
 * One set of objects serves every trial, changed in place: a trial is valid
 * until the next one, so judge candidates one after another (await each) and
 * keep nothing of a trial's build or facts.
 */
export class SlotTrials {
  private readonly facts: Facts
  private readonly numbers: Partial<Record<SlotId, string>>
  private readonly build: ResolvedBuild

  constructor(
    build: ResolvedBuild,
    readonly slot: SlotId,
    private readonly graph: FitGraph,
  ) {
    this.build = { ...build, parts: { ...build.parts }, ids: { ...build.ids } }
    this.numbers = Object.fromEntries(Object.entries(build.parts).map(([other, part]) => [other, part!.partNumber]))
    // The figures are the trial's own; this placeholder is replaced in every trial.
    this.facts = buildFacts(build.parts, {} as FigureFacts, build.context, this.numbers)
  }

  /** The build with `part` (catalogue id `id`) in the slot, and its facts; `reads` notes a read of the part's number. */
  trial(id: number, part: CandidatePart, reads?: CandidateReads): { build: ResolvedBuild; facts: Facts } {
    const { slot, build, facts, numbers } = this
    const parts = build.parts
    parts[slot] = part as Part
    build.ids[slot] = id
    numbers[slot] = part.partNumber
    facts[slot] = part.attributes
    facts.figures = computeFigures(parts, build.context, () => findCompanions(this.graph, parts))
    facts.slots = reads ? reads.trackNumber(numbers, slot) : numbers
    return { build, facts }
  }
}
