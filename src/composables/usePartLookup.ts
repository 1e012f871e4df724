import { watch, type MaybeRefOrGetter, toValue } from 'vue'
import type { PartLookup } from '@shared/schemas/part-lookup'
import { partsApi } from '@/api/parts'
import { useRemote } from './useRemote'

/** Near matches for a number the catalogue does not know: numbers a character or two away and marks containing it. */
export function usePartLookup(text: MaybeRefOrGetter<string>) {
  const remote = useRemote<PartLookup>()
  const load = () => {
    const q = toValue(text).trim()
    if (q) void remote.run((signal) => partsApi.lookup(q, signal))
    else remote.reset()
  }
  watch(() => toValue(text), load, { immediate: true })
  return { ...remote, reload: load }
}
