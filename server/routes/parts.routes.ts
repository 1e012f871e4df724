import { Router } from 'express'
import { z } from 'zod'
import { partListQuerySchema } from '../../shared/schemas/part'
import { requireSignIn } from '../auth/require-role'
import { parseParams, parseQuery } from '../middleware/validate'
import type { PartService } from '../services/part.service'

export const partNumberParamsSchema = z.object({ partNumber: z.string().trim().min(1).max(100) })

export function partRoutes(parts: PartService): Router {
  const router = Router()
  router.get('/parts', requireSignIn, async (req, res) => {
    res.json(await parts.list(parseQuery(partListQuerySchema, req)))
  })
  router.get('/parts/:partNumber', requireSignIn, async (req, res) => {
    res.json(await parts.get(parseParams(partNumberParamsSchema, req).partNumber))
  })
  return router
}
