import { rm } from 'node:fs/promises'
import path from 'node:path'
import { Router } from 'express'
import { z } from 'zod'
import { can, importTypesFor, rolesFor } from '../../shared/permissions'
import type { Role } from '../../shared/schemas/auth'
import { EXPORT_FILES, importFieldsSchema } from '../../shared/schemas/imports'
import { requireRole } from '../auth/require-role'
import type { AppConfig } from '../config/env'
import { AppError } from '../errors/app-error'
import { UTF8_BOM } from '../../shared/csv-cells'
import { csvUpload } from './csv-upload'
import { parseBody, parseParams } from '../middleware/validate'
import type { ExportService } from './export.service'
import type { ImportService } from './import.service'
import { streamImport, wantsProgress } from './import-stream'

const batchParamsSchema = z.object({ id: z.coerce.number().int().positive('Give a batch id.') })
const exportParamsSchema = z.object({ file: z.enum(EXPORT_FILES, { error: () => `Export ${EXPORT_FILES.join(', ')}.` }) })

/** A name safe to show and store: no folders, no control characters, not endless. */
function cleanFileName(name: string): string {
  const base = path
    .basename(name.replace(/\\/g, '/'))
    .replace(/\p{Cc}/gu, '')
    .trim()
  return (base || 'upload.csv').slice(0, 200)
}

/** Refuses a kind of file the role may not bring in (a counter imports only the stock book). */
function requireImportType(role: Role, type: string) {
  const allowed: string[] = importTypesFor(role)
  if (!allowed.includes(type)) {
    throw new AppError(403, 'forbidden', `Your role may import ${allowed.join(', ')} files only; ${type} files are an editor's.`)
  }
}

export function importRoutes(services: { imports: ImportService; exports: ExportService }, config: AppConfig): Router {
  const router = Router()
  const importers = requireRole(...rolesFor('imports.open'))

  router.get('/imports', importers, async (req, res) => {
    const batches = await services.imports.list()
    // Editors see every batch (hand edits and field reports too); the counter its stock imports.
    const allowed: string[] = importTypesFor(req.user!.role)
    res.json(can(req.user!.role, 'imports.manage') ? batches : batches.filter((batch) => allowed.includes(batch.type)))
  })

  router.post('/imports', importers, csvUpload(config.importMaxBytes, config.uploadTempDir), async (req, res) => {
    const file = req.file
    try {
      const fields = parseBody(importFieldsSchema, req)
      requireImportType(req.user!.role, fields.type)
      if (!file) throw AppError.badRequest('Attach the CSV file in the form field "file".')
      const user = req.user!
      const input = {
        ...fields,
        filePath: file.path,
        fileName: cleanFileName(file.originalname),
        fileSize: file.size,
        user: { id: user.id, name: user.name, email: user.email, address: req.ip },
      }
      if (wantsProgress(req)) {
        await streamImport(res, (onProgress) => services.imports.run({ ...input, onProgress }))
        return
      }
      const result = await services.imports.run(input)
      res.status(result.batchId === undefined ? 200 : 201).json(result)
    } finally {
      if (file) await rm(file.path, { force: true })
    }
  })

  router.post('/imports/:id/revert', importers, async (req, res) => {
    const { id } = parseParams(batchParamsSchema, req)
    const batch = await services.imports.batch(id)
    if (batch) requireImportType(req.user!.role, batch.type)
    res.json(await services.imports.revert(id, { id: req.user!.id, name: req.user!.name, email: req.user!.email, address: req.ip }))
  })

  // Editors' tool for the spreadsheet round trip; the catalogue as one file is not a counter task.
  router.get('/export/:file', importers, async (req, res) => {
    const { file } = parseParams(exportParamsSchema, req)
    requireImportType(req.user!.role, file.replace('.csv', ''))
    const stamp = new Date().toISOString().slice(0, 10)
    res.attachment(`fitwright-${file.replace('.csv', '')}-${stamp}.csv`)
    res.type('text/csv; charset=utf-8')
    res.send(`${UTF8_BOM}${await services.exports.csv(file)}`)
  })

  return router
}
