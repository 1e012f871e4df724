import { BUILD_SLOTS, matingSlots, type SlotId } from './build-template'
import type { Completion } from './schemas/build'

export type GapPick = { slot: SlotId; partNumber: string }

/**
 * The empty slot to fill next: the one with the most chosen mates (its
 * candidates are the most checked), template order among equals. Slots given
 * in `skip` have been tried and could not be filled.
 */
export function nextSlotToFill(completion: Completion, skip: ReadonlySet<SlotId> = new Set()): SlotId | null {
  let best: { slot: SlotId; mates: number } | null = null
  for (const { id } of BUILD_SLOTS) {
    const entry = completion.slots[id]
    if (!entry || entry.candidates.length === 0 || skip.has(id)) continue
    if (!best || entry.matesWith.length > best.mates) best = { slot: id, mates: entry.matesWith.length }
  }
  return best?.slot ?? null
}

/** A slot with chosen mates and no candidate left: nothing in the catalogue can go there any more. */
function isDeadEnd(entry: Completion['slots'][string] | undefined): boolean {
  return !!entry && entry.matesWith.length > 0 && entry.candidates.length === 0
}

/**
 * Whether choosing a part for `slot` leaves one of its empty mates with no
 * part that fits (a crank pulley whose teeth no cam gear matches, say).
 * Mates that were already stuck before the choice do not count against it.
 */
export function createsDeadEnd(slot: SlotId, before: Completion, after: Completion): boolean {
  return matingSlots(slot).some((mate) => isDeadEnd(after.slots[mate]) && !isDeadEnd(before.slots[mate]))
}

/** Why a slot stayed empty after filling, as the server said it. */
export function unfilledNotes(completion: Completion, stuck: ReadonlySet<SlotId> = new Set()): { slot: SlotId; note: string }[] {
  return BUILD_SLOTS.flatMap(({ id }) => {
    const entry = completion.slots[id]
    if (!entry) return []
    if (stuck.has(id)) return [{ slot: id, note: 'every candidate would leave a slot it mates with without a part that fits' }]
    if (entry.candidates.length > 0) return []
    return [{ slot: id, note: entry.note ?? 'no candidate fits the chosen parts' }]
  })
}
