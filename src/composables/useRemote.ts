import { ref, shallowRef, type Ref, type ShallowRef } from 'vue'
import { ApiError } from '@/api/http'

export type Remote<T> = {
  data: ShallowRef<T | null>
  isLoading: Ref<boolean>
  error: Ref<ApiError | null>
  /** Runs a load; a newer run aborts the older one so answers never arrive out of order. */
  run: (load: (signal: AbortSignal) => Promise<T>) => Promise<T | null>
  /** Drops a load in flight and the last answer: there is nothing to show. */
  reset: () => void
}

/** Loading, data and error for one remote resource of a view. */
export function useRemote<T>(initial: T | null = null): Remote<T> {
  const data = shallowRef<T | null>(initial)
  const isLoading = ref(false)
  const error = ref<ApiError | null>(null)
  let controller: AbortController | null = null

  async function run(load: (signal: AbortSignal) => Promise<T>): Promise<T | null> {
    controller?.abort()
    const current = new AbortController()
    controller = current
    isLoading.value = true
    error.value = null
    try {
      const result = await load(current.signal)
      if (controller === current) data.value = result
      return result
    } catch (cause) {
      if (current.signal.aborted) return null
      error.value = cause instanceof ApiError ? cause : new ApiError(0, 'client', 'Something went wrong while loading. Try again.')
      return null
    } finally {
      if (controller === current) isLoading.value = false
    }
  }

  function reset() {
    controller?.abort()
    controller = null
    data.value = initial
    error.value = null
    isLoading.value = false
  }

  return { data, isLoading, error, run, reset }
}
