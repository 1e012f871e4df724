import { z } from 'zod'
import { vehicleChoicesSchema, vehicleSchema, vinAnswerSchema, type VehicleQuery } from '@shared/schemas/vehicles'
import { request } from './http'

export const vehiclesApi = {
  find: (query: VehicleQuery, signal?: AbortSignal) => request('GET', '/vehicles', z.array(vehicleSchema), { query, signal }),
  choices: (query: VehicleQuery, signal?: AbortSignal) => request('GET', '/vehicles/choices', vehicleChoicesSchema, { query, signal }),
  get: (id: number, signal?: AbortSignal) => request('GET', `/vehicles/${id}`, vehicleSchema, { signal }),
  byVin: (vin: string, signal?: AbortSignal) => request('GET', `/vehicles/vin/${encodeURIComponent(vin)}`, vinAnswerSchema, { signal }),
}
