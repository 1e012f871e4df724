import { computed, watch, type Ref } from 'vue'
import { useRoute, useRouter } from 'vue-router'
import type { SubstitutesResponse } from '@shared/schemas/substitutes'
import { substitutesApi } from '@/api/substitutes'
import { queryInt } from '@/lib/route-query'
import { useRemote } from './useRemote'

/** The substitutes view: one page of parts that can replace this one, the page kept in the address. */
export function useSubstitutes(partNumber: Ref<string>) {
  const route = useRoute()
  const router = useRouter()
  const remote = useRemote<SubstitutesResponse>()
  const page = computed(() => Math.max(1, queryInt(route.query.page) ?? 1))
  const load = () => remote.run((signal) => substitutesApi.list(partNumber.value, { page: page.value }, signal))
  watch([partNumber, page], load, { immediate: true })
  const pages = computed(() => {
    const answer = remote.data.value
    return answer ? Math.max(1, Math.ceil(answer.total / answer.pageSize)) : 1
  })
  function showPage(next: number) {
    void router.replace({ query: next > 1 ? { page: String(next) } : {} })
  }
  return { ...remote, reload: load, page, pages, showPage }
}
