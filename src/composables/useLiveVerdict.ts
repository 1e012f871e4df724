import { onBeforeUnmount, watch } from 'vue'
import { usePlannerStore } from '@/stores/planner'

const DEBOUNCE_MS = 300

/** Re-evaluates the build shortly after its slots or context stop changing, so the verdict follows every edit. */
export function useLiveVerdict() {
  const planner = usePlannerStore()
  let timer: ReturnType<typeof setTimeout> | undefined

  watch(
    () => JSON.stringify(planner.query),
    () => {
      clearTimeout(timer)
      timer = setTimeout(() => void planner.evaluate(), DEBOUNCE_MS)
    },
    { immediate: true },
  )
  onBeforeUnmount(() => clearTimeout(timer))
}
