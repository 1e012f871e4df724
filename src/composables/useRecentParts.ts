import { useLocalStorage } from '@vueuse/core'
import type { Part } from '@shared/schemas/part'

const STORAGE_KEY = 'fitwright.recent-parts'
const LIMIT = 8

export type RecentPart = Pick<Part, 'partNumber' | 'name' | 'kind'>

/** What another tab or an older version left in storage is checked, never trusted. */
function read(raw: string): RecentPart[] {
  try {
    const parsed: unknown = JSON.parse(raw)
    return Array.isArray(parsed) ? (parsed as RecentPart[]).filter((p) => typeof p?.partNumber === 'string').slice(0, LIMIT) : []
  } catch {
    return []
  }
}

// One list per browser: the counter terminal is shared by whoever stands at it.
const recent = useLocalStorage<RecentPart[]>(STORAGE_KEY, [], { serializer: { read, write: (value) => JSON.stringify(value) } })

/** The parts last opened on this device, newest first, so a returning customer is one click away. */
export function useRecentParts() {
  function remember(part: RecentPart) {
    const entry = { partNumber: part.partNumber, name: part.name, kind: part.kind }
    recent.value = [entry, ...recent.value.filter((p) => p.partNumber !== part.partNumber)].slice(0, LIMIT)
  }
  return { recent, remember }
}
