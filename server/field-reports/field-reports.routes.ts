import { Router, type Request } from 'express'
import { z } from 'zod'
import { rolesFor } from '../../shared/permissions'
import { fieldReportInputSchema, fieldReportListQuerySchema } from '../../shared/schemas/field-reports'
import { requireRole } from '../auth/require-role'
import { AppError } from '../errors/app-error'
import { parseBody, parseParams, parseQuery } from '../middleware/validate'
import type { FieldReportReviewService } from './field-report-review.service'
import type { FieldReportService } from './field-report.service'
import { photoUpload } from './photo-upload'

const idParams = z.object({ id: z.coerce.number().int().positive('Give a field report id.') })
const photoParams = idParams.extend({ photoId: z.coerce.number().int().positive('Give a photo id.') })
const approveBody = z.strictObject({ note: z.string().trim().max(2000, 'Keep the note under 2,000 characters.').default('') })
const rejectBody = z.strictObject({
  reason: z.string().trim().min(1, 'Say why the report is rejected.').max(2000, 'Keep the reason under 2,000 characters.'),
})
const askBody = z.strictObject({
  question: z.string().trim().min(1, 'Write the question for the reporter.').max(2000, 'Keep the question under 2,000 characters.'),
})
const photoQuery = z.object({ size: z.enum(['display', 'thumb'], { error: () => 'Size is display or thumb.' }).default('display') })

/** The multipart `report` field: JSON checked by the shared schema, with field paths kept. */
function reportField(req: Request) {
  const raw: unknown = (req.body as Record<string, unknown> | undefined)?.report
  if (typeof raw !== 'string' || !raw.trim()) throw AppError.badRequest('Send the report as JSON in the form field "report".')
  let json: unknown
  try {
    json = JSON.parse(raw)
  } catch {
    throw AppError.badRequest('The "report" field is not valid JSON.')
  }
  return fieldReportInputSchema.parse(json)
}

export function fieldReportRoutes(
  services: { fieldReports: FieldReportService; fieldReportReview: FieldReportReviewService },
  limits: { photoMaxBytes: number; uploadTempDir: string },
): Router {
  const router = Router()
  const reports = services.fieldReports
  const review = services.fieldReportReview
  const filers = requireRole(...rolesFor('field-reports.file'))
  const reviewers = requireRole(...rolesFor('field-reports.review'))

  router.post('/field-reports', filers, photoUpload(limits.photoMaxBytes, limits.uploadTempDir), async (req, res) => {
    const input = reportField(req)
    const files = (req.files as Express.Multer.File[] | undefined) ?? []
    const uploads = files.map((file) => ({ path: file.path, originalName: file.originalname }))
    res.status(201).json(await reports.file(input, uploads, req.user!))
  })
  router.get('/field-reports', filers, async (req, res) => {
    res.json(await reports.list(parseQuery(fieldReportListQuerySchema, req), req.user!))
  })
  router.get('/field-reports/:id', filers, async (req, res) => {
    res.json(await reports.get(parseParams(idParams, req).id, req.user!))
  })
  router.get('/field-reports/:id/photos/:photoId', filers, async (req, res) => {
    const { id, photoId } = parseParams(photoParams, req)
    const bytes = await reports.photo(id, photoId, parseQuery(photoQuery, req).size, req.user!)
    res.set('Cache-Control', 'private, max-age=3600').type('image/jpeg').send(bytes)
  })
  router.post('/field-reports/:id/approve', reviewers, async (req, res) => {
    res.json(await review.approve(parseParams(idParams, req).id, parseBody(approveBody, req).note, req.user!))
  })
  router.post('/field-reports/:id/reject', reviewers, async (req, res) => {
    res.json(await review.reject(parseParams(idParams, req).id, parseBody(rejectBody, req).reason, req.user!))
  })
  router.post('/field-reports/:id/ask', reviewers, async (req, res) => {
    res.json(await review.ask(parseParams(idParams, req).id, parseBody(askBody, req).question, req.user!))
  })
  return router
}
