import { Router } from 'express'
import { outboxQuerySchema } from '../../shared/schemas/mail'
import { rolesFor } from '../../shared/permissions'
import { requireRole } from '../auth/require-role'
import { parseQuery } from '../middleware/validate'
import type { OutboxService } from './outbox.service'

/** The outbox as an admin sees it: every message, queued, sent or failed, with the last error. */
export function mailRoutes(outbox: OutboxService): Router {
  const router = Router()
  router.get('/admin/mail', requireRole(...rolesFor('users.manage')), async (req, res) => {
    const { page, pageSize, status } = parseQuery(outboxQuerySchema, req)
    res.json(await outbox.list(page, pageSize, status))
  })
  return router
}
