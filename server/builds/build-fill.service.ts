import { matingSlots, type SlotId } from '../../shared/build-template'
import { createsDeadEnd, nextSlotToFill, unfilledNotes, type GapPick } from '../../shared/build-fill'
import type { Candidate, EvaluateRequest, FillResult } from '../../shared/schemas/build'
import type { BuildCompletionService } from './build-completion.service'
import type { BuildEvaluationService, ResolvedBuild } from './build-evaluation.service'
import type { FitGraphIndex } from '../fitment/fit-graph'

/** Candidates that would have needed fewer modifications than the chosen one but were set back (not road-legal, a danger). */
function passedOver(slot: SlotId, chosen: Candidate, candidates: Candidate[]): FillResult['skipped'] {
  return candidates
    .filter((c) => c !== chosen && c.setBackFor.length > 0 && c.modifications.length <= chosen.modifications.length)
    .map((c) => ({ slot, partNumber: c.part.partNumber, reason: c.setBackFor.join(' ') }))
}

/** Candidates tried for one slot before it is left empty. */
const TRIES_PER_SLOT = 5

export class BuildFillService {
  constructor(
    private readonly graphIndex: FitGraphIndex,
    private readonly evaluation: BuildEvaluationService,
    private readonly completion: BuildCompletionService,
  ) {}

  /**
   * Fills the empty slots one at a time, the most constrained first, each with
   * the best candidate that does not leave a mating slot without any part that
   * fits; says what stayed empty and why. Greedy filling alone paints itself
   * into corners (a crank pulley no cam gear matches), hence the look-ahead.
   */
  async fill(request: EvaluateRequest): Promise<FillResult> {
    const graph = await this.graphIndex.snapshot()
    let build: ResolvedBuild = await this.evaluation.resolve(request)
    const reads = this.completion.reads()
    const filled: GapPick[] = []
    const stuck = new Set<SlotId>()
    const skipped: FillResult['skipped'] = []
    let completion = await this.completion.completeBuild(build, graph, TRIES_PER_SLOT, { reads })
    for (let slot = nextSlotToFill(completion); slot; slot = nextSlotToFill(completion, stuck)) {
      let accepted = false
      for (const candidate of completion.slots[slot]?.candidates ?? []) {
        const trial: ResolvedBuild = {
          ...build,
          parts: { ...build.parts, [slot]: candidate.part },
          ids: { ...build.ids, [slot]: graph.byNumber.get(candidate.part.partNumber)! },
        }
        // Only the slot's mates can become dead ends by this choice.
        const mates = await this.completion.completeBuild(trial, graph, TRIES_PER_SLOT, {
          only: matingSlots(slot),
          reads,
          firstFound: true,
        })
        if (createsDeadEnd(slot, completion, mates)) {
          skipped.push({
            slot,
            partNumber: candidate.part.partNumber,
            reason: 'it would leave a slot it mates with without a part that fits',
          })
          continue
        }
        build = trial
        filled.push({ slot, partNumber: candidate.part.partNumber })
        accepted = true
        skipped.push(...passedOver(slot, candidate, completion.slots[slot]?.candidates ?? []))
        break
      }
      if (!accepted) stuck.add(slot)
      completion = await this.completion.completeBuild(build, graph, TRIES_PER_SLOT, { reads })
    }
    return {
      slots: Object.fromEntries(Object.entries(build.parts).map(([slot, part]) => [slot, part!.partNumber])),
      filled,
      unfilled: unfilledNotes(completion, stuck),
      skipped,
    }
  }
}
