import type { Database } from '../db/database'
import type { ImportIssue, ImportType } from '../../shared/schemas/imports'
import type { CatalogueChanges } from '../fitment/fit-graph'
import type { ChangeList } from './import-change-list'
import { planLinks } from './links/link-plan'
import { LinkRows } from './links/link-rows'
import { writeLinks } from './links/link-write'
import { planParts } from './parts/part-plan'
import { PartRows } from './parts/part-rows'
import { writeParts } from './parts/part-write'
import { planStock } from './stock/stock-plan'
import { StockRows } from './stock/stock-rows'
import { writeStock } from './stock/stock-write'
import { planVehicles } from './vehicles/vehicle-plan'
import { VehicleRows } from './vehicles/vehicle-rows'
import { writeVehicles } from './vehicles/vehicle-write'

/** What a write touched: catalogue records for the fit graph, parts whose shelves changed for the stock index. */
export type Touched = { catalogue: CatalogueChanges; stockParts: number[] }

/** Called once for each record written, for the write phase's progress. */
export type Tick = () => void

export type Planned = {
  changes: ChangeList
  errors: ImportIssue[]
  /** How many records the write will write, for a determinate progress bar. */
  writes: number
  /** Writes the plan as batch `batchId`; `now` is the batch's time, which its records carry. */
  write: (batchId: number, now: Date, tick?: Tick) => Promise<Touched>
}

type Rows = { onHeader: (cells: string[], row: number) => void; onRow: (cells: string[], row: number) => void }

/** The checked rows of one file, and how to weigh them against the database (at preview and again at commit). */
export type Work = { rows: Rows; plan: (db: Database) => Promise<Planned> }

type Plan = { changes: ChangeList; issues: ImportIssue[] }

function work<R extends Rows, P extends Plan>(
  rows: R,
  plan: (db: Database, rows: R) => Promise<P>,
  writes: (plan: P) => number,
  write: (db: Database, plan: P, batchId: number, now: Date, tick: Tick) => Promise<Touched>,
): Work {
  return {
    rows,
    plan: async (db) => {
      const planned = await plan(db, rows)
      return {
        changes: planned.changes,
        errors: planned.issues,
        writes: writes(planned),
        write: (batchId, now, tick = () => {}) => write(db, planned, batchId, now, tick),
      }
    },
  }
}

const createsAndUpdates = (plan: { creates: unknown[]; updates: unknown[] }) => plan.creates.length + plan.updates.length

export function importWork(type: ImportType): Work {
  switch (type) {
    case 'parts':
      return work(new PartRows(), planParts, createsAndUpdates, async (db, plan, batchId, now, tick) => ({
        catalogue: { parts: await writeParts(db, plan, batchId, now, tick) },
        stockParts: [],
      }))
    case 'links':
      return work(
        new LinkRows(),
        planLinks,
        (plan) =>
          plan.linkDeletes.length +
          plan.identityDeletes.length +
          plan.linkUpdates.length +
          plan.identityUpdates.length +
          plan.linkCreates.length +
          plan.identityCreates.length,
        async (db, plan, batchId, now, tick) => ({ catalogue: await writeLinks(db, plan, batchId, now, tick), stockParts: [] }),
      )
    case 'vehicles':
      return work(new VehicleRows(), planVehicles, createsAndUpdates, async (db, plan, batchId, _now, tick) => {
        await writeVehicles(db, plan, batchId, tick)
        return { catalogue: {}, stockParts: [] }
      })
    case 'stock':
      return work(new StockRows(), planStock, createsAndUpdates, async (db, plan, batchId, now, tick) => ({
        catalogue: {},
        stockParts: await writeStock(db, plan, batchId, now, tick),
      }))
  }
}
