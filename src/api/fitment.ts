import { fitsResponseSchema } from '@shared/schemas/fitment'
import { request } from './http'

export const fitmentApi = {
  /** Everything the catalogue and the rules say fits a part; filtered on the client so counts stay visible. */
  fits: (partNumber: string, signal?: AbortSignal) =>
    request('GET', `/parts/${encodeURIComponent(partNumber)}/fits`, fitsResponseSchema, { signal }),
}
