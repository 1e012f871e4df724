import { Router } from 'express'
import { z } from 'zod'
import { rolesFor } from '../../shared/permissions'
import { siteInputSchema, stockInputSchema, stockListQuerySchema, stockUpdateSchema } from '../../shared/schemas/stock'
import { requireRole } from '../auth/require-role'
import { parseBody, parseParams, parseQuery } from '../middleware/validate'
import type { StockService } from './stock.service'

const idParams = z.object({ id: z.coerce.number().int().positive('Give a stock item id.') })
const labelParams = z.object({ label: z.string().trim().min(1).max(60) })

export function stockRoutes(stock: StockService): Router {
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
  return router
}
