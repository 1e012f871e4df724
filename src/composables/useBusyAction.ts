import { ref } from 'vue'

/**
 * An action that cannot run twice at once: a second call while the first runs
 * (a double click lands before the button shows itself disabled) is ignored.
 */
export function useBusyAction<Args extends unknown[]>(action: (...args: Args) => Promise<unknown>) {
  const isRunning = ref(false)
  async function run(...args: Args): Promise<void> {
    if (isRunning.value) return
    isRunning.value = true
    try {
      await action(...args)
    } finally {
      isRunning.value = false
    }
  }
  return { run, isRunning }
}
