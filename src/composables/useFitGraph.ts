import { computed, watch } from 'vue'
import { useRoute, useRouter } from 'vue-router'
import type { GraphPath, Neighbourhood } from '@shared/schemas/graph'
import { graphApi } from '@/api/graph'
import { queryInt, queryText } from '@/lib/route-query'
import { useRemote } from './useRemote'

export type GraphMode = 'neighbourhood' | 'path'

/**
 * The fit graph view: a part's neighbourhood (`/graph/:partNumber?depth=2`) or
 * the path between two parts (`/graph/path?from=&to=`), both read from the address.
 */
export function useFitGraph() {
  const route = useRoute()
  const router = useRouter()
  const remote = useRemote<Neighbourhood | GraphPath>()

  const mode = computed<GraphMode>(() => (route.name === 'graph-path' ? 'path' : 'neighbourhood'))
  const partNumber = computed(() => (typeof route.params.partNumber === 'string' ? route.params.partNumber : ''))
  const depth = computed<1 | 2>(() => (queryInt(route.query.depth) === 2 ? 2 : 1))
  const from = computed(() => queryText(route.query.from))
  const to = computed(() => queryText(route.query.to))

  function load() {
    if (mode.value === 'neighbourhood' && partNumber.value) {
      return remote.run((signal) => graphApi.neighbourhood(partNumber.value, depth.value, signal))
    }
    if (mode.value === 'path' && from.value && to.value) {
      return remote.run((signal) => graphApi.path(from.value, to.value, signal))
    }
    remote.data.value = null
    return Promise.resolve(null)
  }
  watch([mode, partNumber, depth, from, to], load, { immediate: true })

  const neighbourhood = computed(() => (remote.data.value && 'centre' in remote.data.value ? remote.data.value : null))
  const path = computed(() => (remote.data.value && 'found' in remote.data.value ? remote.data.value : null))
  /** The parts drawn as the centre: the centre part, or both ends of a path. */
  const highlight = computed(() =>
    path.value ? [path.value.nodes[0]?.id, path.value.nodes.at(-1)?.id].filter((id): id is string => !!id) : [],
  )

  const depthQuery = (value: 1 | 2) => (value === 2 ? { depth: '2' } : {})
  const recentre = (centre: string) => router.push({ name: 'graph', params: { partNumber: centre }, query: depthQuery(depth.value) })
  const setDepth = (value: 1 | 2) => router.replace({ query: depthQuery(value) })
  const open = (part: string) => router.push({ name: 'part', params: { partNumber: part } })
  const findPath = (start: string, end: string) => router.push({ name: 'graph-path', query: { from: start, to: end } })

  return { ...remote, reload: load, mode, partNumber, depth, from, to, neighbourhood, path, highlight, recentre, setDepth, open, findPath }
}
