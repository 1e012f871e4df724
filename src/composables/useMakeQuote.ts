import { useRouter } from 'vue-router'
import type { QuoteRequest } from '@shared/schemas/quotes'
import { quotesApi } from '@/api/quotes'
import { useBusyAction } from './useBusyAction'
import { useNotify } from './useNotify'

/** Makes a quote (from a saved sheet or the planner's build) and opens it. */
export function useMakeQuote() {
  const router = useRouter()
  const notify = useNotify()
  const { run, isRunning } = useBusyAction(async (request: QuoteRequest) => {
    try {
      const quote = await quotesApi.create(request)
      await router.push({ name: 'quote', params: { id: quote.id } })
    } catch (error) {
      notify.failure('No quote made', error)
    }
  })
  return { make: run, isMaking: isRunning }
}
