import { reactive, watch } from 'vue'
import type { Site, StockList, StockStatus } from '@shared/schemas/stock'
import { stockApi } from '@/api/stock'
import { useRemote } from './useRemote'

export type StockFilters = { site: string; status: StockStatus | ''; page: number }
const PAGE_SIZE = 25

/** The units on the shelves, filtered by site and status, a page at a time. */
export function useStockList() {
  const filters = reactive<StockFilters>({ site: '', status: 'available', page: 1 })
  const units = useRemote<StockList>()
  const sites = useRemote<Site[]>([])

  const load = () =>
    units.run((signal) =>
      stockApi.list(
        { site: filters.site || undefined, status: filters.status || undefined, page: filters.page, pageSize: PAGE_SIZE },
        signal,
      ),
    )
  watch(
    () => [filters.site, filters.status],
    () => {
      filters.page = 1
    },
  )
  watch(() => ({ ...filters }), load, { immediate: true })
  void sites.run((signal) => stockApi.sites(signal))

  return { filters, units, sites, pageSize: PAGE_SIZE }
}
