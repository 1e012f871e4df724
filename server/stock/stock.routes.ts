import { Router } from 'express'
import { z } from 'zod'
import { rolesFor } from '../../shared/permissions'
import { siteInputSchema, stockInputSchema, stockListQuerySchema, stockUpdateSchema } from '../../shared/schemas/stock'
import { requireRole } from '../auth/require-role'
import { parseBody, parseParams, parseQuery } from '../middleware/validate'
import type { StockService } from './stock.service'
import type { StockPhotoService } from './stock-photo.service'
import { photoUpload } from '../field-reports/photo-upload'

const idParams = z.object({ id: z.coerce.number().int().positive('Give a stock item id.') })
const labelParams = z.object({ label: z.string().trim().min(1).max(60) })
const photoParams = idParams.extend({ photoId: z.coerce.number().int().positive('Give a photo id.') })
const photoQuery = z.object({ size: z.enum(['display', 'thumb'], { error: () => 'Size is display or thumb.' }).default('display') })

export function stockRoutes(
  stock: StockService,
  photos: StockPhotoService,
  limits: { photoMaxBytes: number; uploadTempDir: string },
): Router {
  const router = Router()
  const readers = requireRole(...rolesFor('catalogue.read'))
  const keepers = requireRole(...rolesFor('stock.manage'))
  const siteKeepers = requireRole(...rolesFor('catalogue.edit'))

  router.get('/sites', readers, async (_req, res) => {
    res.json(await stock.sites())
  })
  router.post('/sites', siteKeepers, async (req, res) => {
    res.status(201).json(await stock.createSite(parseBody(siteInputSchema, req)))
  })
  router.get('/stock', readers, async (req, res) => {
    res.json(await stock.list(parseQuery(stockListQuerySchema, req)))
  })
  router.get('/stock/label/:label', readers, async (req, res) => {
    res.json(await stock.byLabel(parseParams(labelParams, req).label))
  })
  router.get('/stock/:id', readers, async (req, res) => {
    res.json(await stock.get(parseParams(idParams, req).id))
  })
  router.post('/stock', keepers, async (req, res) => {
    res.status(201).json(await stock.create(parseBody(stockInputSchema, req)))
  })
  router.patch('/stock/:id', keepers, async (req, res) => {
    res.json(await stock.update(parseParams(idParams, req).id, parseBody(stockUpdateSchema, req)))
  })
  router.get('/stock/:id/photos', readers, async (req, res) => {
    res.json(await photos.list(parseParams(idParams, req).id))
  })
  router.post('/stock/:id/photos', keepers, photoUpload(limits.photoMaxBytes, limits.uploadTempDir, 'unit'), async (req, res) => {
    const files = (req.files as Express.Multer.File[] | undefined) ?? []
    res.status(201).json(await photos.add(parseParams(idParams, req).id, files))
  })
  router.get('/stock/:id/photos/:photoId', readers, async (req, res) => {
    const { id, photoId } = parseParams(photoParams, req)
    const bytes = await photos.photo(id, photoId, parseQuery(photoQuery, req).size)
    res.type('image/jpeg').set('Cache-Control', 'private, max-age=3600').send(bytes)
  })
  router.delete('/stock/:id/photos/:photoId', keepers, async (req, res) => {
    const { id, photoId } = parseParams(photoParams, req)
    await photos.remove(id, photoId)
    res.status(204).end()
  })
  return router
}
