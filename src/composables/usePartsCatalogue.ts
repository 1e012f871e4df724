import { computed, watch } from 'vue'
import { useRoute, useRouter } from 'vue-router'
import type { PartList } from '@shared/schemas/part'
import type { PartKind } from '@shared/schemas/part-kinds'
import { partsApi } from '@/api/parts'
import { queryInt, queryKind, queryText } from '@/lib/route-query'
import { useRemote } from './useRemote'

const PAGE_SIZES = [25, 50, 100] as const

/**
 * The catalogue's search, kind filter and page live in the address, so a
 * filtered list can be bookmarked or sent to a colleague.
 */
export function usePartsCatalogue() {
  const route = useRoute()
  const router = useRouter()
  const remote = useRemote<PartList>()

  const q = computed(() => queryText(route.query.q))
  const kind = computed(() => queryKind(route.query.kind))
  const page = computed(() => Math.max(1, queryInt(route.query.page) ?? 1))
  const pageSize = computed(() => {
    const size = queryInt(route.query.size)
    return size !== undefined && (PAGE_SIZES as readonly number[]).includes(size) ? size : PAGE_SIZES[0]
  })

  function update(change: { q?: string; kind?: PartKind | null; page?: number; size?: number }) {
    const next = {
      q: change.q ?? q.value,
      kind: change.kind === null ? undefined : (change.kind ?? kind.value),
      page: change.page ?? (change.q !== undefined || change.kind !== undefined ? 1 : page.value),
      size: change.size ?? pageSize.value,
    }
    void router.replace({
      query: {
        ...(next.q ? { q: next.q } : {}),
        ...(next.kind ? { kind: next.kind } : {}),
        ...(next.page > 1 ? { page: String(next.page) } : {}),
        ...(next.size !== PAGE_SIZES[0] ? { size: String(next.size) } : {}),
      },
    })
  }

  function load() {
    return remote.run((signal) => partsApi.list({ q: q.value, kind: kind.value, page: page.value, pageSize: pageSize.value }, signal))
  }

  watch([q, kind, page, pageSize], load, { immediate: true })

  return { ...remote, q, kind, page, pageSize, pageSizes: PAGE_SIZES, update, reload: load }
}
