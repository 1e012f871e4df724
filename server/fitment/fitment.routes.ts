import { Router } from 'express'
import { fitsQuerySchema } from '../../shared/schemas/fitment'
import { neighbourhoodQuerySchema, pathQuerySchema } from '../../shared/schemas/graph'
import { rolesFor } from '../../shared/permissions'
import { requireRole } from '../auth/require-role'
import { parseParams, parseQuery } from '../middleware/validate'
import type { FitmentService } from './fitment.service'
import type { GraphService } from './graph.service'
import type { ModificationService } from '../catalogue/modification.service'
import type { RuleBook } from '../reasoning/rule-book'
import { partNumberParamsSchema } from '../../shared/schemas/part'

export function fitmentRoutes(services: {
  fitment: FitmentService
  graph: GraphService
  modifications: ModificationService
  rules: RuleBook
}): Router {
  const router = Router()
  const readers = requireRole(...rolesFor('catalogue.read'))

  router.get('/parts/:partNumber/fits', readers, async (req, res) => {
    const { partNumber } = parseParams(partNumberParamsSchema, req)
    res.json(await services.fitment.fitsFor(partNumber, parseQuery(fitsQuerySchema, req), req.user!.homeSiteId))
  })
  router.get('/graph/path', readers, async (req, res) => {
    const { from, to } = parseQuery(pathQuerySchema, req)
    res.json(await services.graph.path(from, to))
  })
  router.get('/graph/neighbourhood/:partNumber', readers, async (req, res) => {
    const { partNumber } = parseParams(partNumberParamsSchema, req)
    res.json(await services.graph.neighbourhood(partNumber, parseQuery(neighbourhoodQuerySchema, req).depth))
  })
  router.get('/modifications', readers, async (_req, res) => {
    res.json(await services.modifications.list())
  })
  router.get('/rules', readers, (_req, res) => {
    res.json(services.rules.summaries())
  })
  return router
}
