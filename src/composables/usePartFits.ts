import { computed, watch, type Ref } from 'vue'
import { useRoute, useRouter } from 'vue-router'
import { RELATIONS, type FitsResponse } from '@shared/schemas/fitment'
import { fitmentApi } from '@/api/fitment'
import { filterFits, groupFits, kindsIn, relationCounts, type FitFilters } from '@/lib/fit-groups'
import { queryKind, queryOneOf, queryText } from '@/lib/route-query'
import { useRemote } from './useRemote'

/**
 * The part page: the part, its identical numbers and what fits it. The
 * filters live in the address (`?relation=fits&kind=block&inferred=0`) so a
 * counter can send exactly this view; filtering is done here so every filter
 * can show how many answers it holds.
 */
export function usePartFits(partNumber: Ref<string>) {
  const route = useRoute()
  const router = useRouter()
  const remote = useRemote<FitsResponse>()

  const filters = computed<FitFilters>(() => ({
    relation: queryOneOf(route.query.relation, RELATIONS),
    kind: queryKind(route.query.kind),
    inferred: queryText(route.query.inferred) !== '0',
  }))

  function setFilters(change: Partial<FitFilters>) {
    const next = { ...filters.value, ...change }
    void router.replace({
      query: {
        ...(next.relation ? { relation: next.relation } : {}),
        ...(next.kind ? { kind: next.kind } : {}),
        ...(next.inferred ? {} : { inferred: '0' }),
      },
    })
  }

  const load = () => remote.run((signal) => fitmentApi.fits(partNumber.value, signal))
  watch(partNumber, load, { immediate: true })

  const results = computed(() => remote.data.value?.results ?? [])
  const visible = computed(() => filterFits(results.value, filters.value))
  const groups = computed(() => groupFits(visible.value))
  const counts = computed(() => relationCounts(results.value, filters.value))
  const kinds = computed(() => kindsIn(results.value))

  return { ...remote, reload: load, filters, setFilters, visible, groups, counts, kinds }
}
