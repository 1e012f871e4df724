import { Router, type Request } from 'express'
import { z } from 'zod'
import { rolesFor } from '../../shared/permissions'
import { fieldReportInputSchema, fieldReportListQuerySchema } from '../../shared/schemas/field-reports'
import { requireRole } from '../auth/require-role'
import { AppError } from '../errors/app-error'
import { parseParams, parseQuery } from '../middleware/validate'
import type { FieldReportService } from './field-report.service'
import { photoUpload } from './photo-upload'

const idParams = z.object({ id: z.coerce.number().int().positive('Give a field report id.') })
const photoParams = idParams.extend({ photoId: z.coerce.number().int().positive('Give a photo id.') })
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

export function fieldReportRoutes(reports: FieldReportService, limits: { photoMaxBytes: number }): Router {
  const router = Router()
  const filers = requireRole(...rolesFor('field-reports.file'))

  router.post('/field-reports', filers, photoUpload(limits.photoMaxBytes), async (req, res) => {
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
  return router
}
