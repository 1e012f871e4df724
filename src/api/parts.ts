import { partListSchema, partSchema, type PartListQuery } from '@shared/schemas/part'
import { request } from './http'

export const partsApi = {
  list: (query: Partial<PartListQuery>, signal?: AbortSignal) => request('GET', '/parts', partListSchema, { query, signal }),
  get: (partNumber: string, signal?: AbortSignal) => request('GET', `/parts/${encodeURIComponent(partNumber)}`, partSchema, { signal }),
}
