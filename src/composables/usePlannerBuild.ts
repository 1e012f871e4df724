import { computed } from 'vue'
import { useRoute, useRouter } from 'vue-router'
import type { SlotId } from '@shared/build-template'
import type { BuildContext } from '@shared/schemas/build'
import {
  filledSlotCount,
  plannerFromQuery,
  plannerToQuery,
  sameBuild,
  withContext,
  withSlots,
  type PlannerState,
} from '@/lib/planner-query'
import { sheetState, usePlannerStore } from '@/stores/planner'

const PLANNER_ROUTES = new Set(['planner', 'planner-sheet'])

/**
 * The build in progress is the address and nothing else: reading it parses the
 * route; a change the user makes pushes a new history entry, so Back undoes it.
 * Off the planner's routes (while leaving) it reads the last planner address.
 */
export function usePlannerBuild() {
  const route = useRoute()
  const router = useRouter()
  const planner = usePlannerStore()

  const state = computed<PlannerState>(() =>
    plannerFromQuery(PLANNER_ROUTES.has(String(route.name)) ? route.query : (planner.lastAddress?.query ?? {})),
  )
  const query = computed(() => plannerToQuery(state.value))
  const filledCount = computed(() => filledSlotCount(state.value.slots))
  const isDirty = computed(
    () =>
      planner.ticksChanged || (planner.sheet ? !sameBuild(plannerToQuery(sheetState(planner.sheet)), query.value) : filledCount.value > 0),
  )

  /** `replace` is for what the user did not do (a mark turned into its current number). */
  async function go(next: PlannerState, how: 'push' | 'replace' = 'push') {
    const nextQuery = plannerToQuery(next)
    if (!PLANNER_ROUTES.has(String(route.name)) || sameBuild(route.query, nextQuery)) return
    await router[how]({ name: route.name!, params: route.params, query: nextQuery })
  }

  return {
    state,
    slots: computed(() => state.value.slots),
    context: computed(() => state.value.context),
    query,
    filledCount,
    isDirty,
    go,
    setSlot: (slot: SlotId, partNumber: string | null) => go(withSlots(state.value, { [slot]: partNumber })),
    setSlots: (changes: Partial<Record<SlotId, string | null>>, how: 'push' | 'replace' = 'push') =>
      go(withSlots(state.value, changes), how),
    setContext: (change: Partial<BuildContext>) => go(withContext(state.value, change)),
  }
}
