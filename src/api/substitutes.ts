import { substitutesResponseSchema, type SubstitutesQuery } from '@shared/schemas/substitutes'
import { request } from './http'

export const substitutesApi = {
  list: (partNumber: string, query: Partial<SubstitutesQuery>, signal?: AbortSignal) =>
    request('GET', `/parts/${encodeURIComponent(partNumber)}/substitutes`, substitutesResponseSchema, { query, signal }),
}
