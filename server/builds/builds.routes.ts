import { Router } from 'express'
import { z } from 'zod'
import { buildSheetInputSchema, buildSheetUpdateSchema, completeRequestSchema, evaluateRequestSchema } from '../../shared/schemas/build'
import { rolesFor } from '../../shared/permissions'
import { requireRole } from '../auth/require-role'
import { parseBody, parseParams } from '../middleware/validate'
import type { BuildCompletionService } from './build-completion.service'
import type { BuildEvaluationService } from './build-evaluation.service'
import type { BuildFillService } from './build-fill.service'
import type { BuildSheetService } from './build-sheet.service'

const idParams = z.object({ id: z.coerce.number().int().positive('Give a build sheet id.') })

export function buildRoutes(services: {
  evaluation: BuildEvaluationService
  completion: BuildCompletionService
  fill: BuildFillService
  sheets: BuildSheetService
}): Router {
  const router = Router()
  const evaluators = requireRole(...rolesFor('builds.evaluate'))
  const savers = requireRole(...rolesFor('builds.save'))

  router.post('/builds/evaluate', evaluators, async (req, res) => {
    res.json(await services.evaluation.evaluate(parseBody(evaluateRequestSchema, req), req.user!))
  })
  router.post('/builds/complete', evaluators, async (req, res) => {
    const { limit, only, ...request } = parseBody(completeRequestSchema, req)
    res.json(await services.completion.complete(request, limit, only, req.user!.homeSiteId))
  })
  router.post('/builds/fill', evaluators, async (req, res) => {
    res.json(await services.fill.fill(parseBody(evaluateRequestSchema, req)))
  })
  router.get('/builds', savers, async (req, res) => {
    res.json(await services.sheets.list(req.user!))
  })
  router.post('/builds', savers, async (req, res) => {
    res.status(201).json(await services.sheets.create(parseBody(buildSheetInputSchema, req), req.user!))
  })
  router.get('/builds/:id', savers, async (req, res) => {
    res.json(await services.sheets.get(parseParams(idParams, req).id, req.user!))
  })
  router.put('/builds/:id', savers, async (req, res) => {
    res.json(await services.sheets.update(parseParams(idParams, req).id, parseBody(buildSheetUpdateSchema, req), req.user!))
  })
  router.delete('/builds/:id', savers, async (req, res) => {
    await services.sheets.remove(parseParams(idParams, req).id, req.user!)
    res.status(204).end()
  })
  return router
}
