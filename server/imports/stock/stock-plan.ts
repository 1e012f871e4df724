import type { Database } from '../../db/database'
import type { FieldChange, ImportIssue } from '../../../shared/schemas/imports'
import { normalisePartCode } from '../../../shared/schemas/part'
import { ChangeList } from '../import-change-list'
import { stockCells, type StockColumn, type StockUnit } from './stock-cells'
import type { StockEntry, StockGiven, StockRows } from './stock-rows'

/** A stock_item row as stored, every column, so a revert can write it back. */
export type StockRecord = Omit<StockUnit, 'partNumber' | 'site'> & {
  id: number
  partId: number
  siteId: number
  batchId: number | null
  reservedUntil: string | null
  createdAt: string | Date
  updatedAt: string | Date
}

export type StockPlanned = { partId: number; siteId: number; unit: StockUnit }

export type StockPlan = {
  changes: ChangeList
  issues: ImportIssue[]
  creates: StockPlanned[]
  updates: (StockPlanned & { previous: StockRecord })[]
}

const defined = <T extends object>(value: T) => Object.fromEntries(Object.entries(value).filter(([, v]) => v !== undefined)) as Partial<T>

const NEW_UNIT: Omit<StockUnit, 'partNumber' | 'site' | 'condition' | 'grade' | 'priceCents'> = {
  coreChargeCents: 0,
  location: '',
  mileageKm: null,
  donorVin: null,
  donorYear: null,
  status: 'available',
  damageNotes: '',
  label: null,
}

function fieldChanges(before: StockUnit | null, after: StockUnit): FieldChange[] {
  const left = before ? stockCells(before) : null
  const right = stockCells(after)
  return (Object.keys(right) as StockColumn[])
    .filter((column) => (left ? left[column] !== right[column] : right[column] !== ''))
    .map((field) => ({ field, before: left?.[field] ?? '', after: right[field] }))
}

/**
 * Weighs the checked rows against the shelves. A labelled row is the unit with
 * that label (updated, or created when no unit has it). An unlabelled row is
 * an unlabelled unit that reads the same in every column the file has, each
 * such unit matched once, or else a new unit: so importing the same delivery
 * twice does not put it on the shelf twice. Reservations belong to quotes, so
 * a file can neither make nor undo one.
 */
export async function planStock(db: Database, rows: StockRows): Promise<StockPlan> {
  const partIds = new Map<string, number>()
  const partNumbers = new Map<number, string>()
  const partKeys = new Map<string, string>()
  for (const part of await db.all<{ id: number; partNumber: string; partKey: string }>('SELECT "id", "partNumber", "partKey" FROM part')) {
    partIds.set(part.partNumber, part.id)
    partNumbers.set(part.id, part.partNumber)
    partKeys.set(part.partKey, part.partNumber)
  }
  const siteIds = new Map<string, number>()
  const siteNames = new Map<number, string>()
  for (const site of await db.all<{ id: number; name: string }>('SELECT "id", "name" FROM site')) {
    siteIds.set(site.name, site.id)
    siteNames.set(site.id, site.name)
  }
  const unitOf = (record: StockRecord): StockUnit => ({
    partNumber: partNumbers.get(record.partId) ?? '',
    site: siteNames.get(record.siteId) ?? '',
    condition: record.condition,
    grade: record.grade,
    priceCents: record.priceCents,
    coreChargeCents: record.coreChargeCents,
    location: record.location,
    mileageKm: record.mileageKm,
    donorVin: record.donorVin,
    donorYear: record.donorYear,
    status: record.status,
    damageNotes: record.damageNotes,
    label: record.label,
  })
  const header = rows.header!
  const present = (
    Object.keys(stockCells({ ...NEW_UNIT, partNumber: '', site: '', condition: 'new', grade: null, priceCents: 0 })) as StockColumn[]
  ).filter((column) => header.has(column))
  const signature = (unit: StockUnit) => {
    const cells = stockCells(unit)
    return JSON.stringify(present.map((column) => cells[column]))
  }
  const byLabel = new Map<string, StockRecord>()
  const unlabelled = new Map<string, StockRecord[]>()
  for (const record of await db.all<StockRecord>('SELECT * FROM stock_item ORDER BY "id"')) {
    if (record.label !== null) {
      byLabel.set(record.label, record)
      continue
    }
    const key = signature(unitOf(record))
    const list = unlabelled.get(key)
    if (list) list.push(record)
    else unlabelled.set(key, [record])
  }

  const plan: StockPlan = { changes: new ChangeList(), issues: [], creates: [], updates: [] }
  const issues = rows.issues.clone()
  const reject = (entry: StockEntry, column: string, message: string) => {
    for (const row of entry.rows) issues.add(row, column, message)
  }
  for (const entry of rows.entries()) {
    const { given } = entry
    const partId = partIds.get(given.partNumber)
    const siteId = siteIds.get(given.site)
    if (partId === undefined) {
      const similar = partKeys.get(normalisePartCode(given.partNumber))
      reject(
        entry,
        'part_number',
        `No part ${given.partNumber} in the catalogue${similar ? ` (did you mean ${similar}?)` : ''}; import it in a parts file first.`,
      )
    }
    if (siteId === undefined) reject(entry, 'site', `No site named "${given.site}"; add the site first, or correct the name.`)
    const alike = given.label ? undefined : unlabelled.get(signature(fill(given)))
    const stored = given.label ? byLabel.get(given.label) : alike?.[0]
    const before = stored ? unitOf(stored) : null
    const unit: StockUnit = before ? { ...before, ...defined(given) } : fill(given)
    if (unit.status === 'reserved' && before?.status !== 'reserved')
      reject(entry, 'status', 'A unit is reserved by accepting a quote, not by an import; write available or sold.')
    if (before?.status === 'reserved' && unit.status !== 'reserved')
      reject(
        entry,
        'status',
        `Unit ${before.label ?? before.partNumber} is held by an accepted quote; leave it reserved, and sell or release it at the counter.`,
      )
    if (partId === undefined || siteId === undefined || issues.has(entry.rows[0]!)) continue
    // Each unlabelled unit on the shelf answers for one row only.
    alike?.shift()
    const [firstRow] = entry.rows as [number]
    const key = unit.label ?? `${unit.partNumber} at ${unit.site}`
    plan.changes.repeats(entry.rows.length - 1)
    if (!stored) {
      plan.creates.push({ partId, siteId, unit })
      plan.changes.create(firstRow, key, () => fieldChanges(null, unit))
      continue
    }
    const differs = (Object.keys(unit) as (keyof StockUnit)[]).some((field) => unit[field] !== before![field])
    const fields = fieldChanges(before, unit)
    // Values that differ yet read the same in a cell (text the file cannot hold as stored) are still written, and said so.
    plan.changes.compare(
      firstRow,
      key,
      differs ? (fields.length ? fields : [{ field: 'value', before: 'as stored', after: 'as in the file' }]) : [],
    )
    if (differs) plan.updates.push({ partId, siteId, unit, previous: stored })
  }
  plan.changes.rejected(issues.count)
  plan.issues = issues.sorted()
  return plan
}

function fill(given: StockGiven): StockUnit {
  return { ...NEW_UNIT, ...defined(given) } as StockUnit
}
