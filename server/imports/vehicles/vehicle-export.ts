import type { Database } from '../../db/database'
import { SLOT_IDS, type SlotId } from '../../../shared/build-template'
import { VEHICLE_COLUMNS, slotColumn } from '../../../shared/import-files'
import { toCsv } from '../../../shared/csv-cells'
import { pushTo } from '../../lib/map-list'
import type { VehicleRecord } from './vehicle-plan'

/** Every vehicle application with its original part per slot, in the vehicles import format. */
export async function vehiclesCsv(db: Database): Promise<string> {
  const vehicles = await db.all<VehicleRecord>(
    'SELECT * FROM vehicle_application ORDER BY "make", "model", "yearFrom", "yearTo", "body", "market", "engineFamily", "id"',
  )
  const originals = new Map<number, { slot: SlotId; partNumber: string }[]>()
  const rows = await db.all<{ vehicleId: number; slot: SlotId; partNumber: string }>(
    'SELECT o."vehicleId", o."slot", p."partNumber" FROM vehicle_original o JOIN part p ON p."id" = o."partId"',
  )
  for (const { vehicleId, slot, partNumber } of rows) pushTo(originals, vehicleId, { slot, partNumber })
  return toCsv([
    [...VEHICLE_COLUMNS, ...SLOT_IDS.map(slotColumn)],
    ...vehicles.map((v) => {
      const bySlot = new Map((originals.get(v.id) ?? []).map((o) => [o.slot, o.partNumber]))
      return [
        String(v.yearFrom),
        String(v.yearTo),
        v.make,
        v.model,
        v.body,
        v.market,
        v.engineFamily,
        ...SLOT_IDS.map((slot) => bySlot.get(slot) ?? ''),
      ]
    }),
  ])
}
