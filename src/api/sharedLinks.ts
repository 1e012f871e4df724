import { shareAnswerSchema, sharedViewSchema, type ShareRequest } from '@shared/schemas/shared-links'
import { ensureCsrfToken, request } from './http'

export type SharedKind = 'sheet' | 'quote'
const BASE = { sheet: '/builds', quote: '/quotes' } as const

export const sharedLinksApi = {
  share: (kind: SharedKind, id: number, body: ShareRequest) => request('POST', `${BASE[kind]}/${id}/share`, shareAnswerSchema, { body }),
  /** Opens a mailed link without a session (the token in the body, never in an address). */
  async open(token: string, signal?: AbortSignal) {
    await ensureCsrfToken()
    return request('POST', '/shared/open', sharedViewSchema, { body: { token }, signal })
  },
}
