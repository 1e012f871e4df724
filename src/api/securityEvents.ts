import { securityEventPageSchema, type SecurityEventKind } from '@shared/schemas/security-events'
import { request } from './http'

export const securityEventsApi = {
  page: (query: { page: number; pageSize: number; kind?: SecurityEventKind }, signal?: AbortSignal) =>
    request('GET', '/admin/security-events', securityEventPageSchema, { query, signal }),
}
