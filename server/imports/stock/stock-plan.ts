import { chunks, placeholders, type Database } from '../../db/database'
import type { FieldChange, ImportIssue } from '../../../shared/schemas/imports'
import { unknownPartMessages } from '../unknown-part'
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
  const entries = [...rows.entries()]
  const { partIds, partNumbers } = await namedParts(db, entries)
  const unknownPart = unknownPartMessages(db)
  const siteIds = new Map<string, number>()
  const siteNames = new Map<number, string>()
  for (const site of await db.all<{ id: number; name: string }>('SELECT "id", "name" FROM site')) {
    siteIds.set(site.name, site.id)
    siteNames.set(site.id, site.name)
  }
  const { labelled, unlabelledUnits } = await namedUnits(db, entries, partIds, partNumbers)
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
  const byLabel = new Map(labelled.map((record) => [record.label!, record]))
  const unlabelled = new Map<string, StockRecord[]>()
  for (const record of unlabelledUnits) {
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
  for (const entry of entries) {
    const { given } = entry
    const partId = partIds.get(given.partNumber)
    const siteId = siteIds.get(given.site)
    if (partId === undefined) {
      reject(entry, 'part_number', await unknownPart(given.partNumber))
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

/** The parts the file names, by number and id, read a chunk at a time. */
async function namedParts(db: Database, entries: readonly StockEntry[]) {
  const partIds = new Map<string, number>()
  const partNumbers = new Map<number, string>()
  for (const numbers of chunks([...new Set(entries.map((entry) => entry.given.partNumber))])) {
    const found = await db.all<{ id: number; partNumber: string }>(
      `SELECT "id", "partNumber" FROM part WHERE "partNumber" IN (${placeholders(numbers.length)})`,
      numbers,
    )
    for (const part of found) {
      partIds.set(part.partNumber, part.id)
      partNumbers.set(part.id, part.partNumber)
    }
  }
  return { partIds, partNumbers }
}

/**
 * The units a file can mean: those with a label it names, and the unlabelled
 * units of the parts it names (in id order, so a row takes the oldest alike).
 * Parts of labelled units the file does not name are added to `partNumbers`.
 */
async function namedUnits(db: Database, entries: readonly StockEntry[], partIds: Map<string, number>, partNumbers: Map<number, string>) {
  const labels = [...new Set(entries.flatMap((entry) => (entry.given.label ? [entry.given.label] : [])))]
  const labelled: StockRecord[] = []
  for (const chunk of chunks(labels)) {
    labelled.push(...(await db.all<StockRecord>(`SELECT * FROM stock_item WHERE "label" IN (${placeholders(chunk.length)})`, chunk)))
  }
  const unknownParts = [...new Set(labelled.map((record) => record.partId))].filter((id) => !partNumbers.has(id))
  for (const ids of chunks(unknownParts)) {
    for (const part of await db.all<{ id: number; partNumber: string }>(
      `SELECT "id", "partNumber" FROM part WHERE "id" IN (${placeholders(ids.length)})`,
      ids,
    ))
      partNumbers.set(part.id, part.partNumber)
  }
  const unlabelledUnits: StockRecord[] = []
  for (const ids of chunks([...new Set(partIds.values())])) {
    unlabelledUnits.push(
      ...(await db.all<StockRecord>(
        `SELECT * FROM stock_item WHERE "label" IS NULL AND "partId" IN (${placeholders(ids.length)}) ORDER BY "id"`,
        ids,
      )),
    )
  }
  // Chunks each come in id order; the whole list must too.
  unlabelledUnits.sort((a, b) => a.id - b.id)
  return { labelled, unlabelledUnits }
}

function fill(given: StockGiven): StockUnit {
  return { ...NEW_UNIT, ...defined(given) } as StockUnit
}
