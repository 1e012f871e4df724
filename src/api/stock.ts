import { z } from 'zod'
import {
  siteSchema,
  stockItemSchema,
  stockListSchema,
  stockPhotoListSchema,
  type StockInput,
  type StockStatus,
  type StockUpdate,
} from '@shared/schemas/stock'
import { apiUrl, request } from './http'

export type StockQuery = { part?: string; site?: string; status?: StockStatus; page?: number; pageSize?: number }

export const stockApi = {
  sites: (signal?: AbortSignal) => request('GET', '/sites', z.array(siteSchema), { signal }),
  list: (query: StockQuery, signal?: AbortSignal) => request('GET', '/stock', stockListSchema, { query, signal }),
  get: (id: number, signal?: AbortSignal) => request('GET', `/stock/${id}`, stockItemSchema, { signal }),
  byLabel: (label: string, signal?: AbortSignal) =>
    request('GET', `/stock/label/${encodeURIComponent(label)}`, stockItemSchema, { signal }),
  create: (input: StockInput) => request('POST', '/stock', stockItemSchema, { body: input }),
  update: (id: number, change: StockUpdate) => request('PATCH', `/stock/${id}`, stockItemSchema, { body: change }),
  photos: (id: number, signal?: AbortSignal) => request('GET', `/stock/${id}/photos`, stockPhotoListSchema, { signal }),
  addPhotos(id: number, photos: File[]) {
    const form = new FormData()
    for (const photo of photos) form.append('photos', photo, photo.name)
    return request('POST', `/stock/${id}/photos`, stockPhotoListSchema, { body: form })
  },
  removePhoto: (id: number, photoId: number) => request('DELETE', `/stock/${id}/photos/${photoId}`, z.null()),
  photoUrl: (id: number, photoId: number, size: 'display' | 'thumb' = 'display') =>
    apiUrl(`/stock/${id}/photos/${photoId}`, size === 'thumb' ? { size } : {}),
}
