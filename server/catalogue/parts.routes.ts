import { Router } from 'express'
import { partListQuerySchema, partNumberParamsSchema } from '../../shared/schemas/part'
import { rolesFor } from '../../shared/permissions'
import { requireRole } from '../auth/require-role'
import { parseParams, parseQuery } from '../middleware/validate'
import type { PartService } from './part.service'

export function partRoutes(parts: PartService): Router {
  const router = Router()
  const readers = requireRole(...rolesFor('catalogue.read'))
  router.get('/parts', readers, async (req, res) => {
    res.json(await parts.list(parseQuery(partListQuerySchema, req)))
  })
  router.get('/parts/:partNumber', readers, async (req, res) => {
    res.json(await parts.get(parseParams(partNumberParamsSchema, req).partNumber))
  })
  return router
}
