import type Database from 'better-sqlite3'
import type { Tick } from '../import-jobs'
import { changeRecorder } from '../../audit/change-log'
import type { Originals, VehiclesPlan } from './vehicle-plan'

/** Writes a vehicles plan with prepared statements; the caller holds the transaction. */
export function writeVehicles(db: Database.Database, plan: VehiclesPlan, batchId: number, tick: Tick = () => {}): void {
  const insertVehicle = db.prepare(
    'INSERT INTO vehicle_application ("yearFrom", "yearTo", "make", "model", "body", "market", "engineFamily", "batchId") VALUES (?, ?, ?, ?, ?, ?, ?, ?)',
  )
  const markVehicle = db.prepare('UPDATE vehicle_application SET "batchId" = ? WHERE "id" = ?')
  const deleteOriginals = db.prepare('DELETE FROM vehicle_original WHERE "vehicleId" = ?')
  const insertOriginal = db.prepare('INSERT INTO vehicle_original ("vehicleId", "slot", "partId") VALUES (?, ?, ?)')
  const writeOriginals = (vehicleId: number, originals: Originals) => {
    for (const [slot, partId] of originals) insertOriginal.run(vehicleId, slot, partId)
  }
  const record = changeRecorder(db, batchId)

  for (const { previous, previousOriginals, originals } of plan.updates) {
    record('vehicle', previous.id, 'updated', previous.batchId, { vehicle_application: [previous], vehicle_original: previousOriginals })
    markVehicle.run(batchId, previous.id)
    deleteOriginals.run(previous.id)
    writeOriginals(previous.id, originals)
    tick()
  }
  for (const { key, originals } of plan.creates) {
    const { lastInsertRowid } = insertVehicle.run(
      key.yearFrom,
      key.yearTo,
      key.make,
      key.model,
      key.body ?? '',
      key.market ?? '',
      key.engineFamily,
      batchId,
    )
    writeOriginals(Number(lastInsertRowid), originals)
    tick()
  }
}
