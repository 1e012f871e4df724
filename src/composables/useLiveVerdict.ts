import { watch } from 'vue'
import { useDebounceFn } from '@vueuse/core'
import { buildKey } from '@/lib/planner-query'
import { usePlannerStore } from '@/stores/planner'
import { usePlannerBuild } from './usePlannerBuild'

const DEBOUNCE_MS = 300

/**
 * Checks the build shortly after the address stops changing, once per build:
 * a mark the server turns into its current number is put in the address as the
 * same build, not checked again.
 */
export function useLiveVerdict() {
  const planner = usePlannerStore()
  const build = usePlannerBuild()

  const evaluate = useDebounceFn(async () => {
    const state = build.state.value
    const current = await planner.evaluate(state)
    if (Object.keys(current).length === 0 || buildKey(build.state.value) !== buildKey(state)) return
    const canonical = { slots: { ...state.slots, ...current }, context: state.context }
    planner.markEvaluated(canonical)
    await build.setSlots(current, 'replace')
  }, DEBOUNCE_MS)

  watch(
    () => buildKey(build.state.value),
    () => void evaluate(),
    { immediate: true },
  )
}
