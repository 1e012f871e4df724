import { Router } from 'express'
import { securityEventQuerySchema } from '../../shared/schemas/security-events'
import { rolesFor } from '../../shared/permissions'
import { requireRole } from '../auth/require-role'
import { parseQuery } from '../middleware/validate'
import type { SecurityEventService } from './security-events.service'

export function securityEventRoutes(events: SecurityEventService): Router {
  const router = Router()
  router.get('/admin/security-events', requireRole(...rolesFor('users.manage')), async (req, res) => {
    res.json(await events.page(parseQuery(securityEventQuerySchema, req)))
  })
  return router
}
