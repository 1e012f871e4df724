import { onMounted } from 'vue'
import type { QuoteSummary } from '@shared/schemas/quotes'
import { quotesApi } from '@/api/quotes'
import { useRemote } from './useRemote'

/** The newest quotes, for the counter to find one a customer comes back about. */
export function useQuotes() {
  const quotes = useRemote<QuoteSummary[]>()
  const load = () => quotes.run((signal) => quotesApi.list(signal))
  onMounted(load)
  return { quotes, load }
}
