import {
  buildSheetListSchema,
  buildSheetSchema,
  completionSchema,
  evaluationSchema,
  fillResultSchema,
  type BuildSheetInput,
  type BuildSheetUpdate,
  type EvaluateRequest,
} from '@shared/schemas/build'
import { request, requestVoid } from './http'

export const buildsApi = {
  evaluate: (body: EvaluateRequest, signal?: AbortSignal) => request('POST', '/builds/evaluate', evaluationSchema, { body, signal }),
  /** Candidates for the empty slots (only those in `only`, when given). */
  complete: (body: EvaluateRequest & { limit?: number; only?: string[] }, signal?: AbortSignal) =>
    request('POST', '/builds/complete', completionSchema, { body, signal }),
  fill: (body: EvaluateRequest) => request('POST', '/builds/fill', fillResultSchema, { body }),
  list: (signal?: AbortSignal) => request('GET', '/builds', buildSheetListSchema, { signal }),
  get: (id: number, signal?: AbortSignal) => request('GET', `/builds/${id}`, buildSheetSchema, { signal }),
  create: (input: BuildSheetInput) => request('POST', '/builds', buildSheetSchema, { body: input }),
  update: (id: number, change: BuildSheetUpdate) => request('PUT', `/builds/${id}`, buildSheetSchema, { body: change }),
  remove: (id: number) => requestVoid('DELETE', `/builds/${id}`),
}
