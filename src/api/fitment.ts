import { fitsResponseSchema, type Relation } from '@shared/schemas/fitment'
import type { PartKind } from '@shared/schemas/part-kinds'
import { request } from './http'

/** Which groups and which page of them; with kind and relation both given the answer is that one group. */
export type FitsRequest = { relation?: Relation; kind?: PartKind; inferred?: boolean; inStock?: boolean; page?: number; pageSize?: number }

function fitsQuery({ relation, kind, inferred = true, inStock = false, page, pageSize }: FitsRequest): string {
  const query = new URLSearchParams()
  if (relation) query.set('relation', relation)
  if (kind) query.set('kind', kind)
  if (!inferred) query.set('inferred', '0')
  if (inStock) query.set('inStock', '1')
  if (page && page > 1) query.set('page', String(page))
  if (pageSize) query.set('pageSize', String(pageSize))
  const text = query.toString()
  return text ? `?${text}` : ''
}

export const fitmentApi = {
  /** What the catalogue and the rules say fits a part: every group's total and one page of each. */
  fits: (partNumber: string, options: FitsRequest = {}, signal?: AbortSignal) =>
    request('GET', `/parts/${encodeURIComponent(partNumber)}/fits${fitsQuery(options)}`, fitsResponseSchema, { signal }),
}
