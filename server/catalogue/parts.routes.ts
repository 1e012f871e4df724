import { Router } from 'express'
import { partListQuerySchema, partNumberParamsSchema } from '../../shared/schemas/part'
import { rolesFor } from '../../shared/permissions'
import { requireRole } from '../auth/require-role'
import { parseParams, parseQuery } from '../middleware/validate'
import type { PartService } from './part.service'
import type { PartLookupService } from './part-lookup.service'
import { partLookupQuerySchema } from '../../shared/schemas/part-lookup'

export function partRoutes(parts: PartService, lookup: PartLookupService): Router {
  const router = Router()
  const readers = requireRole(...rolesFor('catalogue.read'))
  router.get('/parts', readers, async (req, res) => {
    res.json(await parts.list(parseQuery(partListQuerySchema, req)))
  })
  // Before /parts/:partNumber, which would take "lookup" for a number.
  router.get('/parts/lookup', readers, async (req, res) => {
    res.json(await lookup.lookup(parseQuery(partLookupQuerySchema, req).q))
  })
  router.get('/parts/:partNumber', readers, async (req, res) => {
    res.json(await parts.get(parseParams(partNumberParamsSchema, req).partNumber))
  })
  return router
}
