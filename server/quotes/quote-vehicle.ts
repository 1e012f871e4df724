import type { EvaluateRequest } from '../../shared/schemas/build'
import type { QuoteVehicle } from '../../shared/schemas/quotes'
import type { Vehicle } from '../../shared/schemas/vehicles'
import { AppError } from '../errors/app-error'
import type { VehicleService } from '../vehicles/vehicle.service'

/** The one value all the applications share, or null when they differ. */
function shared<T>(values: readonly T[]): T | null {
  return values.length > 0 && values.every((value) => value === values[0]) ? values[0]! : null
}

/** The applications that share the most original parts with the build: a VIN names a maker and year, the parts narrow the model. */
function closest(applications: readonly Vehicle[], slots: Record<string, unknown>): Vehicle[] {
  const chosen = new Set(Object.values(slots).filter((value): value is string => typeof value === 'string'))
  const scored = applications.map((vehicle) => ({
    vehicle,
    same: vehicle.originals.filter((original) => chosen.has(original.partNumber)).length,
  }))
  const best = Math.max(0, ...scored.map((entry) => entry.same))
  return best === 0 ? [...applications] : scored.filter((entry) => entry.same === best).map((entry) => entry.vehicle)
}

/** A lookup that finds nothing (an application removed since, a VIN that cannot be read) leaves the make and model out, never fails the quote. */
async function orNothing<T>(lookup: Promise<T>): Promise<T | null> {
  try {
    return await lookup
  } catch (error) {
    if (error instanceof AppError && error.status < 500) return null
    throw error
  }
}

/**
 * The vehicle a quote is for: model year and VIN as given, and make, model and
 * engine family from the vehicle application the build was planned from, or
 * else from the applications its VIN's maker and year match (a model or engine
 * family only where those agree).
 */
export async function quoteVehicle(build: EvaluateRequest, vehicles: Pick<VehicleService, 'get' | 'byVin'>): Promise<QuoteVehicle> {
  const vehicle: QuoteVehicle = {
    modelYear: build.chassisModelYear ?? null,
    vin: build.vin ?? null,
    make: null,
    model: null,
    engineFamily: null,
  }
  const planned = build.vehicleId ? await orNothing(vehicles.get(build.vehicleId)) : null
  if (planned) return { ...vehicle, make: planned.make, model: planned.model, engineFamily: planned.engineFamily }
  const decoded = build.vin ? await orNothing(vehicles.byVin(build.vin)) : null
  if (!decoded || decoded.applications.length === 0) return vehicle
  const matches = closest(decoded.applications, build.slots)
  return {
    ...vehicle,
    make: shared(matches.map((match) => match.make)),
    model: shared(matches.map((match) => match.model)),
    engineFamily: shared(matches.map((match) => match.engineFamily)),
  }
}

/** What the quotes list searches: customer, VIN, make, model and engine family, in lower case. */
export function quoteSearchText(customer: string, vehicle: QuoteVehicle): string {
  return [customer, vehicle.vin, vehicle.make, vehicle.model, vehicle.engineFamily]
    .filter((part): part is string => Boolean(part))
    .join(' ')
    .toLowerCase()
}
