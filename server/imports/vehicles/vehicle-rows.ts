import { SLOT_IDS, type SlotId } from '../../../shared/build-template'
import { slotColumn } from '../../../shared/import-files'
import { restoreCell } from '../../../shared/csv-cells'
import { readHeader, rowShapeProblems, type Header } from '../import-header'
import { RowIssues } from '../import-issues'

/** The fields that name a vehicle application; body and market are null when the file has no such column. */
export type VehicleKey = {
  yearFrom: number
  yearTo: number
  make: string
  model: string
  body: string | null
  market: string | null
  engineFamily: string
}

/** One application of a vehicles file: the part number per slot column the file has ('' for an empty cell: no original). */
export type VehicleEntry = { rows: number[]; key: VehicleKey; originals: Map<SlotId, string>; fingerprint: string }

const NAME_LIMIT = 80
const YEAR = /^\d{4}$/

function year(cell: string, column: string, add: (column: string, message: string) => void): number {
  if (!cell) {
    add(column, `${column} is required.`)
    return 0
  }
  if (!YEAR.test(cell)) {
    add(column, `"${cell}" is not a four-digit year.`)
    return 0
  }
  const value = Number(cell)
  if (value < 1950 || value > 2100) add(column, `${value} is outside the model years this catalogue holds (1950 to 2100).`)
  return value
}

function name(cell: string, column: string, required: boolean, add: (column: string, message: string) => void): string {
  if (required && !cell) add(column, `${column} is required.`)
  if (cell.length > NAME_LIMIT) add(column, `Keep ${column} under ${NAME_LIMIT} characters.`)
  return cell
}

export const describeVehicle = (key: VehicleKey) =>
  `${key.yearFrom}–${key.yearTo} ${key.make} ${key.model}${key.body ? ` ${key.body}` : ''}${key.market ? ` (${key.market})` : ''}, ${key.engineFamily}`

/**
 * The rows of a vehicles file, checked on their own (part numbers are looked
 * up later, against the catalogue). An application named twice must list the
 * same parts both times.
 */
export class VehicleRows {
  header: Header | null = null
  readonly issues = new RowIssues()
  private readonly byKey = new Map<string, VehicleEntry>()
  private readonly conflicting = new Set<string>()
  private slotColumns: { slot: SlotId; column: string; index: number }[] = []

  onHeader(cells: string[], row: number) {
    const header = readHeader(cells, row, { type: 'vehicles', extraColumns: 'refused' })
    this.header = header
    this.slotColumns = SLOT_IDS.map((slot) => ({ slot, column: slotColumn(slot), index: header.index(slotColumn(slot)) })).filter(
      (slot) => slot.index >= 0,
    )
  }

  onRow(cells: string[], row: number) {
    const header = this.header!
    const shape = rowShapeProblems(cells, header)
    for (const problem of shape) this.issues.add(row, problem.column, problem.message)
    if (shape.length) return
    const cell = (column: string) => {
      const index = header.index(column)
      return index < 0 ? null : restoreCell(cells[index] ?? '').trim()
    }
    const before = this.issues.count
    const add = (column: string, message: string) => this.issues.add(row, column, message)
    const key: VehicleKey = {
      yearFrom: year(cell('year_from') ?? '', 'year_from', add),
      yearTo: year(cell('year_to') ?? '', 'year_to', add),
      make: name(cell('make') ?? '', 'make', true, add),
      model: name(cell('model') ?? '', 'model', true, add),
      body: header.has('body') ? name(cell('body') ?? '', 'body', false, add) : null,
      market: header.has('market') ? name(cell('market') ?? '', 'market', false, add) : null,
      engineFamily: name(cell('engine_family') ?? '', 'engine_family', true, add),
    }
    if (key.yearFrom && key.yearTo && key.yearTo < key.yearFrom)
      add('year_to', `The last model year (${key.yearTo}) cannot come before the first (${key.yearFrom}).`)
    const originals = new Map<SlotId, string>()
    for (const { slot, column, index } of this.slotColumns) {
      const partNumber = restoreCell(cells[index] ?? '').trim()
      if (partNumber.length > 100) add(column, 'A part number is at most 100 characters.')
      originals.set(slot, partNumber)
    }
    if (this.issues.count > before) return
    this.keep(key, originals, row)
  }

  private keep(key: VehicleKey, originals: Map<SlotId, string>, row: number) {
    const id = JSON.stringify([key.yearFrom, key.yearTo, key.make, key.model, key.body, key.market, key.engineFamily])
    const name = describeVehicle(key)
    if (this.conflicting.has(id)) {
      this.issues.add(row, 'make', `${name} appears more than once with different parts.`)
      return
    }
    const fingerprint = JSON.stringify([...originals])
    const first = this.byKey.get(id)
    if (!first) {
      this.byKey.set(id, { rows: [row], key, originals, fingerprint })
      return
    }
    if (first.fingerprint === fingerprint) {
      first.rows.push(row)
      return
    }
    for (const earlier of first.rows) this.issues.add(earlier, 'make', `${name} is also on row ${row} with different parts.`)
    this.issues.add(row, 'make', `${name} is also on row ${first.rows[0]!} with different parts.`)
    this.conflicting.add(id)
    this.byKey.delete(id)
  }

  entries(): VehicleEntry[] {
    return [...this.byKey.values()]
  }
}
