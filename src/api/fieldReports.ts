import { z } from 'zod'
import { fieldReportListSchema, fieldReportSchema, type FieldReportInput, type FieldReportStatus } from '@shared/schemas/field-reports'
import { apiUrl, request } from './http'

const approvalSchema = z.object({
  report: fieldReportSchema,
  links: z.object({ created: z.array(z.number()), confirmed: z.array(z.number()), contradicted: z.array(z.number()) }),
  batchId: z.number(),
})
export type Approval = z.infer<typeof approvalSchema>

export const fieldReportsApi = {
  /** The report as JSON in the `report` field and the photos as files, in one multipart request. */
  file(report: FieldReportInput, photos: File[]) {
    const form = new FormData()
    form.set('report', JSON.stringify(report))
    for (const photo of photos) form.append('photos', photo, photo.name)
    return request('POST', '/field-reports', fieldReportSchema, { body: form })
  },
  list: (query: { status?: FieldReportStatus; from?: string; to?: string; page?: number; pageSize?: number }, signal?: AbortSignal) =>
    request('GET', '/field-reports', fieldReportListSchema, { query, signal }),
  get: (id: number, signal?: AbortSignal) => request('GET', `/field-reports/${id}`, fieldReportSchema, { signal }),
  approve: (id: number, note: string) => request('POST', `/field-reports/${id}/approve`, approvalSchema, { body: { note } }),
  reject: (id: number, reason: string) => request('POST', `/field-reports/${id}/reject`, fieldReportSchema, { body: { reason } }),
  ask: (id: number, question: string) => request('POST', `/field-reports/${id}/ask`, fieldReportSchema, { body: { question } }),
  photoUrl: (id: number, photoId: number, size: 'display' | 'thumb' = 'display') =>
    apiUrl(`/field-reports/${id}/photos/${photoId}`, size === 'thumb' ? { size } : {}),
}
