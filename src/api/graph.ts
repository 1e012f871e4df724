import { neighbourhoodSchema, pathSchema } from '@shared/schemas/graph'
import { request } from './http'

export const graphApi = {
  neighbourhood: (partNumber: string, depth: 1 | 2, signal?: AbortSignal) =>
    request('GET', `/graph/neighbourhood/${encodeURIComponent(partNumber)}`, neighbourhoodSchema, { query: { depth }, signal }),
  path: (from: string, to: string, signal?: AbortSignal) => request('GET', '/graph/path', pathSchema, { query: { from, to }, signal }),
}
