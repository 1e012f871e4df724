import { quoteListSchema, quoteSchema, type QuoteListQuery, type QuoteRequest } from '@shared/schemas/quotes'
import { request } from './http'

export const quotesApi = {
  /** A quote for a saved build sheet or for the planner's slots as they stand. */
  create: (body: QuoteRequest) => request('POST', '/quotes', quoteSchema, { body }),
  /** A page of the quotes a search finds, newest first. */
  list: (query: QuoteListQuery, signal?: AbortSignal) => request('GET', '/quotes', quoteListSchema, { query, signal }),
  get: (id: number, signal?: AbortSignal) => request('GET', `/quotes/${id}`, quoteSchema, { signal }),
  /** Reserves every unit the quote takes, or none (409 naming the unit that is gone). */
  accept: (id: number) => request('POST', `/quotes/${id}/accept`, quoteSchema),
}
