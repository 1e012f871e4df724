import type { LocationQuery } from 'vue-router'

const text = (value: unknown) => (typeof value === 'string' ? value.trim() : '')

/** The pairs a report form opens with, from its address: `from` and `to`, or `pair=A~B` once per pair. */
export function queryPairs(query: LocationQuery): { from: string; to: string }[] {
  const listed = ([] as unknown[]).concat(query.pair ?? []).flatMap((value) => {
    const [from, to] = text(value).split('~')
    return from && to ? [{ from, to }] : []
  })
  const from = text(query.from)
  const to = text(query.to)
  return from || to ? [{ from, to }, ...listed] : listed
}
