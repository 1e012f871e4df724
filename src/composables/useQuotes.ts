import { ref, watch } from 'vue'
import { watchDebounced } from '@vueuse/core'
import type { QuoteList } from '@shared/schemas/quotes'
import { quotesApi } from '@/api/quotes'
import { useRemote } from './useRemote'

/** Quotes a page at a time, newest first, searched by customer, job number, VIN, make or model, for a customer who comes back. */
export function useQuotes(options: { pageSize?: number; debounceMs?: number } = {}) {
  const quotes = useRemote<QuoteList>()
  const search = ref('')
  const page = ref(1)
  const pageSize = ref(options.pageSize ?? 25)
  const load = () => quotes.run((signal) => quotesApi.list({ q: search.value.trim(), page: page.value, pageSize: pageSize.value }, signal))

  // The request follows the box once typing pauses; a new search starts on its first page.
  watchDebounced(
    search,
    () => {
      if (page.value === 1) void load()
      else page.value = 1
    },
    { debounce: options.debounceMs ?? 300 },
  )
  watch([page, pageSize], () => void load(), { immediate: true })

  function showPage(first: number, rows: number) {
    pageSize.value = rows
    page.value = Math.floor(first / rows) + 1
  }

  return { quotes, search, page, pageSize, load, showPage }
}
