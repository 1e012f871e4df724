import { computed, type MaybeRefOrGetter, toValue } from 'vue'
import type { Part, PartList } from '@shared/schemas/part'
import type { PartKind } from '@shared/schemas/part-kinds'
import { partsApi } from '@/api/parts'
import { useRemote } from './useRemote'

/** Suggestions while typing a part number, mark, name or family; exact and prefix matches come first (server order). */
export function usePartSuggestions(kind?: MaybeRefOrGetter<PartKind | undefined>, pageSize = 8) {
  const remote = useRemote<PartList>()
  const suggestions = computed<Part[]>(() => remote.data.value?.items ?? [])

  async function search(query: string) {
    const q = query.trim()
    await remote.run((signal) => partsApi.list({ q, kind: toValue(kind), pageSize }, signal))
  }

  /** Ends a search without new suggestions (the list component waits for them to change). */
  function settle() {
    const current = remote.data.value
    remote.data.value = current ? { ...current, items: [...current.items] } : { items: [], total: 0 }
  }

  return { ...remote, suggestions, search, settle }
}
