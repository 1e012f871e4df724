import { ref, watch } from 'vue'
import { useRoute, useRouter } from 'vue-router'
import { ApiError } from '@/api/http'
import { isEmptyBuild, sameBuild } from '@/lib/planner-query'
import { useBuildSheetsStore } from '@/stores/buildSheets'
import { usePlannerStore } from '@/stores/planner'

/**
 * Keeps the build in progress and the address in step, both ways:
 * `/planner?block=…&head=…&power=…` for a build, `/planner/:id` for a saved
 * sheet (its slots fill the address when it opens; edits stay in the address).
 */
export function usePlannerRoute() {
  const route = useRoute()
  const router = useRouter()
  const planner = usePlannerStore()
  const sheets = useBuildSheetsStore()
  const sheetError = ref<ApiError | null>(null)
  const isOpeningSheet = ref(false)

  async function fromRoute() {
    const id = route.name === 'planner-sheet' ? Number(route.params.id) : null
    if (id === null) {
      // Back on the planner from another screen: the build in progress stays, and so does its sheet.
      if (isEmptyBuild(route.query) && Object.keys(planner.query).length > 0) {
        if (planner.sheet) void router.replace({ name: 'planner-sheet', params: { id: planner.sheet.id }, query: planner.query })
        else void router.replace({ query: planner.query })
        return
      }
      planner.forgetSheet()
      if (!sameBuild(route.query, planner.query)) planner.applyQuery(route.query)
      return
    }
    if (planner.sheet?.id !== id) {
      sheetError.value = null
      isOpeningSheet.value = true
      try {
        const saved = await sheets.get(id)
        planner.openSheet(saved, !isEmptyBuild(route.query))
      } catch (error) {
        sheetError.value = error instanceof ApiError ? error : new ApiError(0, 'client', 'The build sheet could not be opened.')
        return
      } finally {
        isOpeningSheet.value = false
      }
    }
    if (!isEmptyBuild(route.query) && !sameBuild(route.query, planner.query)) planner.applyQuery(route.query)
  }

  watch(() => [route.name, route.params.id, route.query], fromRoute, { immediate: true })

  watch(
    () => planner.query,
    (query) => {
      if (route.name !== 'planner' && route.name !== 'planner-sheet') return
      // Leaving a sheet (start over): the address of the old sheet must not take the emptied build.
      if (route.name === 'planner-sheet' && planner.sheet?.id !== Number(route.params.id)) return
      if (!sameBuild(route.query, query)) void router.replace({ query })
    },
  )

  return { sheetError, isOpeningSheet }
}
