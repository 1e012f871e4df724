import { ref, shallowRef } from 'vue'
import { matingSlots, type SlotId } from '@shared/build-template'
import type { BuildContext, Completion } from '@shared/schemas/build'
import { buildsApi } from '@/api/builds'
import { partsApi } from '@/api/parts'
import { evaluateBody, plannerToQuery, type PlannerState } from '@/lib/planner-query'
import { slotOptionGroups, type SlotOptionGroup } from '@/lib/slot-options'

const CANDIDATE_LIMIT = 50
const CACHE_SIZE = 24

/*
 * Each search in a picker asks again with the same build, so answers (and
 * requests in flight) are kept by slot and build; the server is asked about
 * that one slot only.
 */
const completions = new Map<string, Promise<Completion>>()

function completionFor(slot: SlotId, slots: PlannerState['slots'], context: BuildContext): Promise<Completion> {
  const key = JSON.stringify([slot, plannerToQuery({ slots, context })])
  let answer = completions.get(key)
  if (!answer) {
    if (completions.size >= CACHE_SIZE) completions.clear()
    answer = buildsApi.complete({ ...evaluateBody({ slots, context }), limit: CANDIDATE_LIMIT, only: [slot] })
    answer.catch(() => completions.delete(key))
    completions.set(key, answer)
  }
  return answer
}

/**
 * Choices for one slot of the planner. Candidates are asked for with this
 * slot left empty, so a filled slot can be changed to another part that fits.
 */
export function useSlotSuggestions(slot: SlotId, build: () => PlannerState) {
  const groups = shallowRef<SlotOptionGroup[]>([])
  const note = ref('')
  const failed = ref('')
  /** The search the choices on show answer (null before the first answer). */
  const answeredQuery = ref<string | null>(null)
  let controller: AbortController | null = null

  async function candidates() {
    const { slots, context } = build()
    const others = { ...slots }
    delete others[slot]
    const mates = matingSlots(slot)
    if (!mates.some((mate) => others[mate])) {
      return { candidates: [], note: `Choose a part for a slot it mates with (${mates.join(', ')}) to see what fits.` }
    }
    const entry = (await completionFor(slot, others, context)).slots[slot]
    return { candidates: entry?.candidates ?? [], note: entry?.note ?? '' }
  }

  async function search(query: string) {
    controller?.abort()
    const current = new AbortController()
    controller = current
    failed.value = ''
    try {
      const [fit, found] = await Promise.all([candidates(), partsApi.list({ kind: slot, q: query.trim(), pageSize: 30 }, current.signal)])
      if (controller !== current) return
      note.value = fit.note
      groups.value = slotOptionGroups(slot, query, fit.candidates, found.items)
      answeredQuery.value = query
    } catch (error) {
      if (current.signal.aborted) return
      failed.value = error instanceof Error ? error.message : 'Suggestions could not be loaded.'
      groups.value = []
    }
  }

  /** Ends a search without new choices (the list component waits for its suggestions to change). */
  function settle() {
    controller?.abort()
    groups.value = [...groups.value]
  }

  return { groups, note, failed, answeredQuery, search, settle }
}
