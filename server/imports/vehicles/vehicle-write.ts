import type { Database } from '../../db/database'
import type { Tick } from '../import-jobs'
import { changeRecorder } from '../../audit/change-log'
import type { Originals, VehiclesPlan } from './vehicle-plan'

/** Writes a vehicles plan; the caller holds the transaction. */
export async function writeVehicles(db: Database, plan: VehiclesPlan, batchId: number, tick: Tick = () => {}): Promise<void> {
  const writeOriginals = async (vehicleId: number, originals: Originals) => {
    for (const [slot, partId] of originals)
      await db.run('INSERT INTO vehicle_original ("vehicleId", "slot", "partId") VALUES (?, ?, ?)', [vehicleId, slot, partId])
  }
  const record = changeRecorder(db, batchId)

  for (const { previous, previousOriginals, originals } of plan.updates) {
    await record('vehicle', previous.id, 'updated', previous.batchId, {
      vehicle_application: [previous],
      vehicle_original: previousOriginals,
    })
    await db.run('UPDATE vehicle_application SET "batchId" = ? WHERE "id" = ?', [batchId, previous.id])
    await db.run('DELETE FROM vehicle_original WHERE "vehicleId" = ?', [previous.id])
    await writeOriginals(previous.id, originals)
    tick()
  }
  for (const { key, originals } of plan.creates) {
    const id = await db.insert(
      `INSERT INTO vehicle_application ("yearFrom", "yearTo", "make", "model", "body", "market", "engineFamily", "batchId")
       VALUES (?, ?, ?, ?, ?, ?, ?, ?) RETURNING "id"`,
      [key.yearFrom, key.yearTo, key.make, key.model, key.body ?? '', key.market ?? '', key.engineFamily, batchId],
    )
    await writeOriginals(id, originals)
    tick()
  }
}
