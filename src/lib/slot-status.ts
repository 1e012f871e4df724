import { BUILD_SLOTS } from '@shared/build-template'
import type { PairJudgement } from '@shared/schemas/build'
import { worstVerdict, type Verdict } from '@shared/schemas/fitment'

export type SlotStatus = { verdict: Verdict; text: string }

/**
 * How a chosen part sits with the parts it mates with: the worst of its pairs,
 * naming the pairs that set it (e.g. "Fits with modification: Head on block").
 */
export function slotStatuses(pairs: readonly PairJudgement[]): Record<string, SlotStatus> {
  const bySlot = new Map<string, PairJudgement[]>()
  for (const pair of pairs) for (const slot of pair.slots) bySlot.set(slot, [...(bySlot.get(slot) ?? []), pair])
  const statuses: Record<string, SlotStatus> = {}
  for (const [slot, own] of bySlot) {
    const verdict = worstVerdict(own.map((pair) => pair.relation))
    const setting = own.filter((pair) => pair.relation === verdict).map((pair) => pair.label)
    statuses[slot] = {
      verdict,
      text: verdict === 'fits' ? `Fits its ${own.length} mating part${own.length === 1 ? '' : 's'}` : setting.join('; '),
    }
  }
  return statuses
}

/** A slot's label from the build template ("head" -> "Cylinder head"); unknown ids stay as they are. */
export function slotLabel(slot: string): string {
  return BUILD_SLOTS.find((entry) => entry.id === slot)?.label ?? slot
}
