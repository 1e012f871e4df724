import { Router } from 'express'
import { z } from 'zod'
import { rolesFor } from '../../shared/permissions'
import { shareRequestSchema, sharedOpenSchema } from '../../shared/schemas/shared-links'
import { requireRole } from '../auth/require-role'
import { parseBody, parseParams } from '../middleware/validate'
import type { SharedLinkService } from './shared-link.service'

const sheetParams = z.object({ id: z.coerce.number().int().positive('Give a build sheet id.') })
const quoteParams = z.object({ id: z.coerce.number().int().positive('Give a quote id.') })

/** Sharing a sheet or a quote by mail, and opening a shared link without an account. */
export function sharedLinkRoutes(links: SharedLinkService): Router {
  const router = Router()
  router.post('/builds/:id/share', requireRole(...rolesFor('builds.save')), async (req, res) => {
    const { id } = parseParams(sheetParams, req)
    res.status(201).json(await links.shareSheet(id, parseBody(shareRequestSchema, req), req.user!))
  })
  router.post('/quotes/:id/share', requireRole(...rolesFor('quotes.share')), async (req, res) => {
    const { id } = parseParams(quoteParams, req)
    res.status(201).json(await links.shareQuote(id, parseBody(shareRequestSchema, req), req.user!))
  })
  // A POST, so the token travels in the body (never in an address a log keeps), behind the CSRF check like set-password.
  router.post('/shared/open', async (req, res) => {
    const { token } = parseBody(sharedOpenSchema, req)
    res.set('Cache-Control', 'no-store').json(await links.open(token))
  })
  return router
}
