import { Router } from 'express'
import { z } from 'zod'
import { rolesFor } from '../../shared/permissions'
import { quoteListQuerySchema, quoteRequestSchema, shopSettingsSchema } from '../../shared/schemas/quotes'
import { requireRole } from '../auth/require-role'
import { parseBody, parseParams, parseQuery } from '../middleware/validate'
import type { ShopSettingsService } from '../settings/shop-settings.service'
import type { QuoteService } from './quote.service'

const idParams = z.object({ id: z.coerce.number().int().positive('Give a quote id.') })

export function quoteRoutes(services: { quotes: QuoteService; shopSettings: ShopSettingsService }): Router {
  const router = Router()
  const quoters = requireRole(...rolesFor('builds.evaluate'))
  router.post('/quotes', quoters, async (req, res) => {
    res.status(201).json(await services.quotes.create(parseBody(quoteRequestSchema, req), req.user!))
  })
  router.get('/quotes', quoters, async (req, res) => {
    res.json(await services.quotes.list(parseQuery(quoteListQuerySchema, req)))
  })
  router.get('/quotes/:id', quoters, async (req, res) => {
    res.json(await services.quotes.get(parseParams(idParams, req).id))
  })
  router.post('/quotes/:id/accept', quoters, async (req, res) => {
    res.json(await services.quotes.accept(parseParams(idParams, req).id))
  })
  router.get('/settings/shop', quoters, async (_req, res) => {
    res.json(await services.shopSettings.get())
  })
  router.put('/settings/shop', requireRole(...rolesFor('users.manage')), async (req, res) => {
    res.json(await services.shopSettings.set(parseBody(shopSettingsSchema, req)))
  })
  return router
}
