import { computed, watch, type Ref } from 'vue'
import { useRoute, useRouter } from 'vue-router'
import { FIT_PAGE_SIZE_DEFAULT, RELATIONS, type FitsResponse, type Relation } from '@shared/schemas/fitment'
import type { PartKind } from '@shared/schemas/part-kinds'
import { fitmentApi } from '@/api/fitment'
import { filterGroups, groupFits, kindsIn, relationCounts, summariseFits, withPage, type FitFilters } from '@/lib/fit-groups'
import { queryInt, queryKind, queryKinds, queryOneOf, queryText } from '@/lib/route-query'
import { useRemote } from './useRemote'

/**
 * The part page: the part, its identical numbers and what fits it. The server
 * answers every group's total and its first page; the filters and the page of
 * one group live in the address (`?kind=block&relation=fits&page=2&inferred=0&stock=1`)
 * so a counter can send exactly this view, and so do the kinds folded away
 * (`?fold=gasket,belt`). Filtering the overview is done here so every filter
 * and the summary can show how many answers it holds.
 */
export function usePartFits(partNumber: Ref<string>) {
  const route = useRoute()
  const router = useRouter()
  const remote = useRemote<FitsResponse>()
  const paged = useRemote<FitsResponse>()

  const filters = computed<FitFilters>(() => ({
    relation: queryOneOf(route.query.relation, RELATIONS),
    kind: queryKind(route.query.kind),
    inferred: queryText(route.query.inferred) !== '0',
    inStock: queryText(route.query.stock) === '1',
    page: Math.max(1, queryInt(route.query.page) ?? 1),
  }))
  /** A page beyond the first is of one group: kind and relation both chosen. */
  const pagedGroup = computed(() => {
    const { kind, relation, page, inferred, inStock } = filters.value
    return kind && relation && page > 1 ? { kind, relation, page, inferred, inStock } : null
  })

  const folded = computed(() => queryKinds(route.query.fold))

  function setFilters(change: Partial<FitFilters>, fold: readonly PartKind[] = folded.value) {
    const next = { ...filters.value, page: 1, ...change }
    void router.replace({
      query: {
        ...(fold.length ? { fold: fold.join(',') } : {}),
        ...(next.relation ? { relation: next.relation } : {}),
        ...(next.kind ? { kind: next.kind } : {}),
        ...(next.inferred ? {} : { inferred: '0' }),
        ...(next.inStock ? { stock: '1' } : {}),
        ...(next.page > 1 ? { page: String(next.page) } : {}),
      },
    })
  }

  /** Opens a page of one group, keeping the inferred filter. */
  function showPage(kind: PartKind, relation: Relation, page: number) {
    setFilters({ kind, relation, page })
  }

  /** Folds the kinds given away (or opens them again), keeping the filters and page. */
  function setFolded(kinds: readonly PartKind[]) {
    setFilters({ page: filters.value.page }, kinds)
  }
  function toggleFold(kind: PartKind) {
    setFolded(folded.value.includes(kind) ? folded.value.filter((other) => other !== kind) : [...folded.value, kind])
  }

  /** From the summary: this kind and relation only, open. */
  function choose(kind: PartKind, relation: Relation) {
    setFilters(
      { kind, relation },
      folded.value.filter((other) => other !== kind),
    )
  }

  const load = () =>
    remote.run((signal) => fitmentApi.fits(partNumber.value, { inferred: filters.value.inferred, inStock: filters.value.inStock }, signal))
  watch([partNumber, () => filters.value.inferred, () => filters.value.inStock], load, { immediate: true })
  const loadPage = () => {
    const group = pagedGroup.value
    if (group) void paged.run((signal) => fitmentApi.fits(partNumber.value, group, signal))
    else paged.data.value = null
  }
  watch([partNumber, pagedGroup], loadPage, { immediate: true })

  const all = computed(() => withPage(remote.data.value?.groups ?? [], pagedGroup.value ? (paged.data.value?.groups ?? null) : null))
  const visible = computed(() => filterGroups(all.value, filters.value))
  const groups = computed(() => groupFits(visible.value))
  const counts = computed(() => relationCounts(all.value, filters.value))
  const kinds = computed(() => kindsIn(all.value))
  const summary = computed(() => summariseFits(all.value, filters.value))
  const pageSize = computed(() => remote.data.value?.pageSize ?? FIT_PAGE_SIZE_DEFAULT)

  const reload = () => {
    void load()
    loadPage()
  }
  return {
    ...remote,
    reload,
    filters,
    setFilters,
    showPage,
    folded,
    setFolded,
    toggleFold,
    choose,
    summary,
    visible,
    groups,
    counts,
    kinds,
    pageSize,
    pageLoading: paged.isLoading,
    pageError: paged.error,
  }
}
