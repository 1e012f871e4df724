import { Router } from 'express'
import { z } from 'zod'
import { rolesFor } from '../../shared/permissions'
import { vehicleQuerySchema } from '../../shared/schemas/vehicles'
import { requireRole } from '../auth/require-role'
import { parseParams, parseQuery } from '../middleware/validate'
import type { VehicleService } from './vehicle.service'

const idParams = z.object({ id: z.coerce.number().int().positive('Give a vehicle id.') })
const vinParams = z.object({ vin: z.string().trim().min(1, 'Give a VIN.').max(40, 'A VIN has 17 characters.') })

export function vehicleRoutes(vehicles: VehicleService): Router {
  const router = Router()
  const readers = requireRole(...rolesFor('catalogue.read'))
  router.get('/vehicles', readers, async (req, res) => {
    res.json(await vehicles.find(parseQuery(vehicleQuerySchema, req)))
  })
  router.get('/vehicles/choices', readers, async (req, res) => {
    res.json(await vehicles.choices(parseQuery(vehicleQuerySchema, req)))
  })
  router.get('/vehicles/vin/:vin', readers, async (req, res) => {
    res.json(await vehicles.byVin(parseParams(vinParams, req).vin))
  })
  router.get('/vehicles/:id', readers, async (req, res) => {
    res.json(await vehicles.get(parseParams(idParams, req).id))
  })
  return router
}
