import { Router } from 'express'
import { rolesFor } from '../../shared/permissions'
import { partNumberParamsSchema } from '../../shared/schemas/part'
import { substitutesQuerySchema } from '../../shared/schemas/substitutes'
import { requireRole } from '../auth/require-role'
import { parseParams, parseQuery } from '../middleware/validate'
import type { SubstitutesService } from './substitutes.service'

export function substituteRoutes(substitutes: SubstitutesService): Router {
  const router = Router()
  router.get('/parts/:partNumber/substitutes', requireRole(...rolesFor('catalogue.read')), async (req, res) => {
    const { partNumber } = parseParams(partNumberParamsSchema, req)
    res.json(await substitutes.substitutesFor(partNumber, parseQuery(substitutesQuerySchema, req)))
  })
  return router
}
