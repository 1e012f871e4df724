import type { VehicleQuery } from '../../shared/schemas/vehicles'
import { chunks, placeholders, type Database } from '../db/database'

export type VehicleRow = {
  id: number
  yearFrom: number
  yearTo: number
  make: string
  model: string
  body: string
  market: string
  engineFamily: string
}
export type OriginalRow = { vehicleId: number; slot: string; partNumber: string; name: string }

const COLUMNS = 'SELECT "id", "yearFrom", "yearTo", "make", "model", "body", "market", "engineFamily" FROM vehicle_application'

function filters(query: VehicleQuery): { clause: string; params: (string | number)[] } {
  const where: string[] = []
  const params: (string | number)[] = []
  if (query.year !== undefined) {
    where.push('"yearFrom" <= ? AND "yearTo" >= ?')
    params.push(query.year, query.year)
  }
  if (query.make) {
    where.push('"make" = ?')
    params.push(query.make)
  }
  if (query.model) {
    where.push('"model" = ?')
    params.push(query.model)
  }
  return { clause: where.length ? ` WHERE ${where.join(' AND ')}` : '', params }
}

/** The vehicle_application and vehicle_original tables. */
export class VehicleRepository {
  constructor(private readonly db: Database) {}

  insert(vehicle: Omit<VehicleRow, 'id'>, originals: { slot: string; partId: number }[]): Promise<number> {
    return this.db.transaction(async (tx) => {
      const id = await tx.insert(
        'INSERT INTO vehicle_application ("yearFrom", "yearTo", "make", "model", "body", "market", "engineFamily") VALUES (?, ?, ?, ?, ?, ?, ?) RETURNING "id"',
        [vehicle.yearFrom, vehicle.yearTo, vehicle.make, vehicle.model, vehicle.body, vehicle.market, vehicle.engineFamily],
      )
      for (const original of originals) {
        await tx.run('INSERT INTO vehicle_original ("vehicleId", "slot", "partId") VALUES (?, ?, ?)', [id, original.slot, original.partId])
      }
      return id
    })
  }

  find(query: VehicleQuery, limit: number): Promise<VehicleRow[]> {
    const { clause, params } = filters(query)
    return this.db.all<VehicleRow>(`${COLUMNS}${clause} ORDER BY "make", "model", "yearFrom", "id" LIMIT ?`, [...params, limit])
  }

  async distinct(column: 'make' | 'model', query: VehicleQuery): Promise<string[]> {
    const { clause, params } = filters(query)
    const rows = await this.db.all<{ value: string }>(
      `SELECT DISTINCT "${column}" AS "value" FROM vehicle_application${clause} ORDER BY "value"`,
      params,
    )
    return rows.map((row) => row.value)
  }

  byId(id: number): Promise<VehicleRow | undefined> {
    return this.db.get<VehicleRow>(`${COLUMNS} WHERE "id" = ?`, [id])
  }

  async originalsOf(vehicleIds: readonly number[]): Promise<OriginalRow[]> {
    const rows: OriginalRow[] = []
    for (const ids of chunks(vehicleIds)) {
      rows.push(
        ...(await this.db.all<OriginalRow>(
          `SELECT o."vehicleId", o."slot", p."partNumber", p."name" FROM vehicle_original o JOIN part p ON p."id" = o."partId"
            WHERE o."vehicleId" IN (${placeholders(ids.length)})`,
          ids,
        )),
      )
    }
    return rows
  }
}
