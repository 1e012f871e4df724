import { linkListSchema, linkSchema, type LinkUpdate } from '@shared/schemas/link'
import type { ReviewStatus } from '@shared/schemas/fitment'
import { request } from './http'

export const linksApi = {
  list: (query: { status?: ReviewStatus; part?: string; contradicted?: '1'; page?: number; pageSize?: number }, signal?: AbortSignal) =>
    request('GET', '/links', linkListSchema, { query, signal }),
  update: (id: number, change: LinkUpdate) => request('PATCH', `/links/${id}`, linkSchema, { body: change }),
}
