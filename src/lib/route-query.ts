import type { LocationQuery } from 'vue-router'
import { PART_KINDS, type PartKind } from '@shared/schemas/part-kinds'

/*
 * Reading values back from the address. Anyone can edit or paste an address,
 * so every reader accepts anything and falls back to "not given": a repeated
 * key counts once (the first), blanks count as absent.
 */
type QueryValue = LocationQuery[string] | undefined

/** The first value of a query key, trimmed; '' when absent. */
export function queryText(value: QueryValue): string {
  const first = Array.isArray(value) ? value[0] : value
  return typeof first === 'string' ? first.trim() : ''
}

/** The value when it is one of `allowed`, else undefined. */
export function queryOneOf<T extends string>(value: QueryValue, allowed: readonly T[]): T | undefined {
  const text = queryText(value)
  return (allowed as readonly string[]).includes(text) ? (text as T) : undefined
}

/** A part kind (`?kind=block`), else undefined. */
export function queryKind(value: QueryValue): PartKind | undefined {
  return queryOneOf(value, PART_KINDS)
}

/** A whole number (`?page=2`), else undefined. */
export function queryInt(value: QueryValue): number | undefined {
  const parsed = Number.parseInt(queryText(value), 10)
  return Number.isNaN(parsed) ? undefined : parsed
}

/** Any finite number (`?power=110.5`), else undefined. */
export function queryNumber(value: QueryValue): number | undefined {
  const text = queryText(value)
  if (!text) return undefined
  const parsed = Number(text)
  return Number.isFinite(parsed) ? parsed : undefined
}

/** A comma-separated list of part kinds (`?fold=gasket,belt`), unknown ones dropped, each once, in catalogue order. */
export function queryKinds(value: QueryValue): PartKind[] {
  const given = new Set(queryText(value).split(','))
  return PART_KINDS.filter((kind) => given.has(kind))
}
