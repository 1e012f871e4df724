import { outboxPageSchema, type OutboxQuery } from '@shared/schemas/mail'
import { request } from './http'

export const mailApi = {
  page: (query: OutboxQuery, signal?: AbortSignal) => request('GET', '/admin/mail', outboxPageSchema, { query, signal }),
}
