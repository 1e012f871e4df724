import { ref, watch } from 'vue'
import { useRoute, useRouter } from 'vue-router'
import { ApiError } from '@/api/http'
import { isEmptyBuild, plannerFromQuery, plannerToQuery } from '@/lib/planner-query'
import { useBuildSheetsStore } from '@/stores/buildSheets'
import { sheetState, usePlannerStore } from '@/stores/planner'

/**
 * What the address means beyond the build itself: `/planner/:id` opens a saved
 * sheet (its build fills an empty address once); `/planner` with an empty
 * address, reached from another screen, goes back to the last build. The build
 * is never copied into a store, so there is nothing to keep in step.
 */
export function usePlannerRoute() {
  const route = useRoute()
  const router = useRouter()
  const planner = usePlannerStore()
  const sheets = useBuildSheetsStore()
  const sheetError = ref<ApiError | null>(null)
  const isOpeningSheet = ref(false)

  async function openSheet(id: number) {
    sheetError.value = null
    isOpeningSheet.value = true
    try {
      const saved = await sheets.get(id)
      if (route.name !== 'planner-sheet' || Number(route.params.id) !== id) return
      planner.openSheet(saved)
      // A shared link to an edited sheet keeps its edits; a plain link shows the sheet as saved.
      if (isEmptyBuild(route.query)) await router.replace({ query: plannerToQuery(sheetState(saved)) })
    } catch (error) {
      sheetError.value = error instanceof ApiError ? error : new ApiError(0, 'client', 'The build sheet could not be opened.')
    } finally {
      isOpeningSheet.value = false
    }
  }

  async function fromRoute(before?: unknown[]) {
    if (route.name === 'planner-sheet') {
      const id = Number(route.params.id)
      // Arriving by the sheet's plain address from elsewhere (the list's Open) shows it as saved now,
      // even if it was open before; emptying the build on the sheet itself is an edit, not a reopening.
      const cameFromElsewhere = before?.[0] !== 'planner-sheet' || Number(before[1]) !== id
      if (planner.sheet?.id !== id || (cameFromElsewhere && isEmptyBuild(route.query))) await openSheet(id)
    } else if (route.name === 'planner') {
      const last = planner.lastAddress
      // Back on the planner from another screen: the build in progress stays, and so does its sheet.
      if (isEmptyBuild(route.query) && last && Object.keys(last.query).length > 0) {
        if (last.sheetId !== null) await router.replace({ name: 'planner-sheet', params: { id: last.sheetId }, query: last.query })
        else await router.replace({ query: last.query })
        return
      }
      planner.forgetSheet()
    } else return
    planner.lastAddress = { sheetId: planner.sheet?.id ?? null, query: plannerToQuery(plannerFromQuery(route.query)) }
  }

  watch(
    () => [route.name, route.params.id, route.query],
    (_now, before) => fromRoute(before),
    { immediate: true },
  )

  return { sheetError, isOpeningSheet }
}
