import type { Database } from '../../db/database'
import type { Tick } from '../import-jobs'
import { changeRecorder } from '../../audit/change-log'
import type { StockPlan, StockPlanned } from './stock-plan'

const FIELDS = [
  'partId',
  'siteId',
  'condition',
  'grade',
  'mileageKm',
  'donorVin',
  'donorYear',
  'damageNotes',
  'location',
  'priceCents',
  'coreChargeCents',
  'status',
  'label',
] as const

function values({ partId, siteId, unit }: StockPlanned) {
  const row = { ...unit, partId, siteId }
  return FIELDS.map((field) => row[field])
}

/**
 * Writes a stock plan; the caller holds the transaction. Every unit written
 * carries the batch's own time (`stamp`) as its updatedAt, so a revert can tell a unit
 * sold, reserved or edited since from one left as the batch wrote it.
 * Answers the parts whose shelves changed, for the stock index.
 */
export async function writeStock(db: Database, plan: StockPlan, batchId: number, stamp: Date, tick: Tick = () => {}): Promise<number[]> {
  const columns = FIELDS.map((field) => `"${field}"`).join(', ')
  const insert = `INSERT INTO stock_item (${columns}, "batchId", "createdAt", "updatedAt") VALUES (${FIELDS.map(() => '?').join(', ')}, ?, ?, ?)`
  const update = `UPDATE stock_item SET ${FIELDS.map((field) => `"${field}" = ?`).join(', ')}, "batchId" = ?, "updatedAt" = ? WHERE "id" = ?`
  const record = changeRecorder(db, batchId)
  const touched = new Set<number>()
  for (const planned of plan.updates) {
    const { previous } = planned
    await record('stock', previous.id, 'updated', previous.batchId, { stock_item: [previous] })
    await db.run(update, [...values(planned), batchId, stamp, previous.id])
    touched.add(previous.partId).add(planned.partId)
    tick()
  }
  for (const planned of plan.creates) {
    await db.run(insert, [...values(planned), batchId, stamp, stamp])
    touched.add(planned.partId)
    tick()
  }
  return [...touched]
}
