import { Router } from 'express'
import { z } from 'zod'
import { identityCreateSchema, linkCreateSchema, linkListQuerySchema, linkUpdateSchema } from '../../shared/schemas/link'
import { rolesFor } from '../../shared/permissions'
import { requireRole } from '../auth/require-role'
import { parseBody, parseParams, parseQuery } from '../middleware/validate'
import type { LinkService } from './link.service'

const idParams = z.object({ id: z.coerce.number().int().positive('Give an id.') })

export function linkRoutes(links: LinkService): Router {
  const router = Router()
  const editors = requireRole(...rolesFor('catalogue.edit'))
  router.get('/links', editors, async (req, res) => {
    res.json(await links.list(parseQuery(linkListQuerySchema, req)))
  })
  router.post('/links', editors, async (req, res) => {
    res.status(201).json(await links.create(parseBody(linkCreateSchema, req), req.user!))
  })
  router.patch('/links/:id', editors, async (req, res) => {
    res.json(await links.update(parseParams(idParams, req).id, parseBody(linkUpdateSchema, req), req.user!))
  })
  router.delete('/links/:id', editors, async (req, res) => {
    await links.remove(parseParams(idParams, req).id, req.user!)
    res.status(204).end()
  })
  router.post('/identities', editors, async (req, res) => {
    res.status(201).json(await links.createIdentity(parseBody(identityCreateSchema, req), req.user!))
  })
  router.delete('/identities/:id', editors, async (req, res) => {
    await links.removeIdentity(parseParams(idParams, req).id, req.user!)
    res.status(204).end()
  })
  return router
}
