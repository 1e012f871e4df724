import { computed } from 'vue'
import { evaluateBody } from '@/lib/planner-query'
import type { QuoteBuild } from '@/lib/quote'
import { usePlannerStore } from '@/stores/planner'
import type { usePlannerBuild } from './usePlannerBuild'

/**
 * What "Make a quote" prices from the planner: the saved sheet while nothing
 * changed since it was saved (the quote then names it), else the build as it
 * stands on screen; nothing while the build is empty.
 */
export function usePlannerQuote(build: ReturnType<typeof usePlannerBuild>) {
  const planner = usePlannerStore()
  return computed<QuoteBuild | null>(() => {
    if (build.filledCount.value === 0) return null
    if (planner.sheet && !build.isDirty.value) return { buildSheetId: planner.sheet.id }
    return evaluateBody(build.state.value)
  })
}
