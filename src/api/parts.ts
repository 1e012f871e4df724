import { partListSchema, partSchema, type PartListQuery } from '@shared/schemas/part'
import { partLookupSchema } from '@shared/schemas/part-lookup'
import { request } from './http'

export const partsApi = {
  list: (query: Partial<PartListQuery>, signal?: AbortSignal) => request('GET', '/parts', partListSchema, { query, signal }),
  lookup: (q: string, signal?: AbortSignal) => request('GET', '/parts/lookup', partLookupSchema, { query: { q }, signal }),
  get: (partNumber: string, signal?: AbortSignal) => request('GET', `/parts/${encodeURIComponent(partNumber)}`, partSchema, { signal }),
}
