import { Router } from 'express'
import { z } from 'zod'
import { homeSiteSchema, userCreateSchema, userUpdateSchema } from '../../shared/schemas/auth'
import { rolesFor } from '../../shared/permissions'
import { requireRole, requireSignIn } from '../auth/require-role'
import { parseBody, parseParams } from '../middleware/validate'
import type { UserService } from './user.service'

const idParamsSchema = z.object({ id: z.coerce.number().int().positive('Give a user id.') })

export function userRoutes(users: UserService): Router {
  const router = Router()
  const adminOnly = requireRole(...rolesFor('users.manage'))
  router.get('/users', adminOnly, async (_req, res) => {
    res.json(await users.list())
  })
  router.post('/users', adminOnly, async (req, res) => {
    res.status(201).json(await users.create(parseBody(userCreateSchema, req)))
  })
  router.patch('/users/:id', adminOnly, async (req, res) => {
    const { id } = parseParams(idParamsSchema, req)
    res.json(
      await users.update(id, parseBody(userUpdateSchema, req), {
        userId: req.user!.id,
        email: req.user!.email,
        sessionId: req.sessionID,
        address: req.ip,
      }),
    )
  })
  // Anyone signed in chooses their own home site; an administrator sets anyone's through PATCH /users/:id.
  router.put('/account/home-site', requireSignIn, async (req, res) => {
    res.json(await users.setHomeSite(req.user!.id, parseBody(homeSiteSchema, req).homeSiteId))
  })
  return router
}
