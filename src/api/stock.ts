import { z } from 'zod'
import { siteSchema, stockItemSchema, stockListSchema, type StockInput, type StockStatus, type StockUpdate } from '@shared/schemas/stock'
import { request } from './http'

export type StockQuery = { part?: string; site?: string; status?: StockStatus; page?: number; pageSize?: number }

export const stockApi = {
  sites: (signal?: AbortSignal) => request('GET', '/sites', z.array(siteSchema), { signal }),
  list: (query: StockQuery, signal?: AbortSignal) => request('GET', '/stock', stockListSchema, { query, signal }),
  get: (id: number, signal?: AbortSignal) => request('GET', `/stock/${id}`, stockItemSchema, { signal }),
  byLabel: (label: string, signal?: AbortSignal) =>
    request('GET', `/stock/label/${encodeURIComponent(label)}`, stockItemSchema, { signal }),
  create: (input: StockInput) => request('POST', '/stock', stockItemSchema, { body: input }),
  update: (id: number, change: StockUpdate) => request('PATCH', `/stock/${id}`, stockItemSchema, { body: change }),
}
