import { computed, ref, watch } from 'vue'
import { useRoute } from 'vue-router'
import type { Quote } from '@shared/schemas/quotes'
import { ApiError } from '@/api/http'
import { quotesApi } from '@/api/quotes'
import { useBusyAction } from './useBusyAction'
import { useNotify } from './useNotify'
import { useRemote } from './useRemote'

/**
 * One quote as the customer will see it, and accepting it. A refused accept
 * (a unit taken by another quote or sold meanwhile) stays on the page, naming
 * the unit, because the counter has to act on it: make a new quote.
 */
export function useQuote() {
  const route = useRoute()
  const notify = useNotify()
  const quote = useRemote<Quote>()
  const acceptError = ref<ApiError | null>(null)
  const id = computed(() => Number(route.params.id))

  const load = () => quote.run((signal) => quotesApi.get(id.value, signal))
  watch(id, load, { immediate: true })

  const reservedUnits = computed(() => quote.data.value?.lines.filter((line) => line.stockItemId !== undefined).length ?? 0)

  const accept = useBusyAction(async () => {
    acceptError.value = null
    try {
      quote.data.value = await quotesApi.accept(id.value)
      notify.success('Quote accepted', `${reservedUnits.value} unit(s) held for this job.`)
    } catch (error) {
      if (error instanceof ApiError && error.status === 409) acceptError.value = error
      else notify.failure('Not accepted', error)
    }
  })

  return { quote, load, acceptError, accept, reservedUnits, print: () => window.print() }
}
