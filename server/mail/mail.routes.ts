import { Router } from 'express'
import { z } from 'zod'
import { rolesFor } from '../../shared/permissions'
import { requireRole } from '../auth/require-role'
import { parseQuery } from '../middleware/validate'
import type { OutboxService } from './outbox.service'

const pageQuery = z.object({
  page: z.coerce.number().int().min(1).max(100_000).default(1),
  pageSize: z.coerce.number().int().min(1).max(100).default(25),
})

/** The outbox as an admin sees it: every message, queued, sent or failed, with the last error. */
export function mailRoutes(outbox: OutboxService): Router {
  const router = Router()
  router.get('/admin/mail', requireRole(...rolesFor('users.manage')), async (req, res) => {
    const { page, pageSize } = parseQuery(pageQuery, req)
    res.json(await outbox.list(page, pageSize))
  })
  return router
}
