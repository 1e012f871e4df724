import type Database from 'better-sqlite3'
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

export type Planned = { changes: ChangeList; errors: ImportIssue[]; write: (batchId: number) => Touched }

type Rows = { onHeader: (cells: string[], row: number) => void; onRow: (cells: string[], row: number) => void }

/** The checked rows of one file, and how to weigh them against the database (at preview and again at commit). */
export type Work = { rows: Rows; plan: (db: Database.Database) => Planned }

type Plan = { changes: ChangeList; issues: ImportIssue[] }

function work<R extends Rows, P extends Plan>(
  rows: R,
  plan: (db: Database.Database, rows: R) => P,
  write: (db: Database.Database, plan: P, batchId: number) => Touched,
): Work {
  return {
    rows,
    plan: (db) => {
      const planned = plan(db, rows)
      return { changes: planned.changes, errors: planned.issues, write: (batchId) => write(db, planned, batchId) }
    },
  }
}

export function importWork(type: ImportType): Work {
  switch (type) {
    case 'parts':
      return work(new PartRows(), planParts, (db, plan, batchId) => ({
        catalogue: { parts: writeParts(db, plan, batchId) },
        stockParts: [],
      }))
    case 'links':
      return work(new LinkRows(), planLinks, (db, plan, batchId) => ({ catalogue: writeLinks(db, plan, batchId), stockParts: [] }))
    case 'vehicles':
      return work(new VehicleRows(), planVehicles, (db, plan, batchId) => {
        writeVehicles(db, plan, batchId)
        return { catalogue: {}, stockParts: [] }
      })
    case 'stock':
      return work(new StockRows(), planStock, (db, plan, batchId) => ({ catalogue: {}, stockParts: writeStock(db, plan, batchId) }))
  }
}
