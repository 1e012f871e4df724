import { BUILD_SLOTS, mates, type SlotId } from '@shared/build-template'
import type { Completion } from '@shared/schemas/build'

export type GapPick = { slot: SlotId; partNumber: string }

/**
 * One round of "fill the gaps": the best candidate for each empty slot, in
 * template order. A candidate was only checked against slots filled before the
 * round, so two slots that mate with each other are never filled in the same
 * round; the next round checks the second against the first.
 */
export function pickFromCompletion(completion: Completion): GapPick[] {
  const picks: GapPick[] = []
  for (const { id } of BUILD_SLOTS) {
    const best = completion.slots[id]?.candidates[0]
    if (!best) continue
    if (picks.some((pick) => mates(pick.slot, id))) continue
    picks.push({ slot: id, partNumber: best.part.partNumber })
  }
  return picks
}

/** Why a slot stayed empty after filling, as the server said it. */
export function unfilledNotes(completion: Completion): { slot: SlotId; note: string }[] {
  return BUILD_SLOTS.flatMap(({ id }) => {
    const entry = completion.slots[id]
    if (!entry || entry.candidates.length > 0) return []
    return [{ slot: id, note: entry.note ?? 'No candidate fits the chosen parts.' }]
  })
}
