import { restoreCell } from '../../../shared/csv-cells'
import { readHeader, rowShapeProblems, type Header } from '../import-header'
import { RowIssues } from '../import-issues'
import { parseCondition, parseDonorVin, parseMoney, parseStatus, parseWhole, type StockColumn, type StockUnit } from './stock-cells'

/** What a row says about a unit; a field is undefined when the file has no column for it (the stored value stays). */
export type StockGiven = Pick<StockUnit, 'partNumber' | 'site' | 'condition' | 'grade' | 'priceCents'> &
  Partial<Omit<StockUnit, 'partNumber' | 'site' | 'condition' | 'grade' | 'priceCents'>>

export type StockEntry = { rows: number[]; given: StockGiven; fingerprint: string }

const LIMITS: Partial<Record<StockColumn, number>> = { part_number: 100, site: 100, location: 100, notes: 2000, label: 60 }

/**
 * The rows of a stock file, checked on their own (parts and sites are looked
 * up later). A labelled row is one unit, so a label named twice must say the
 * same both times; unlabelled rows are each a unit of their own, even when
 * two read alike (two new heads on one shelf).
 */
export class StockRows {
  header: Header | null = null
  readonly issues = new RowIssues()
  private readonly labelled = new Map<string, StockEntry>()
  private readonly unlabelled: StockEntry[] = []
  private readonly conflicting = new Set<string>()

  onHeader(cells: string[], row: number) {
    this.header = readHeader(cells, row, { type: 'stock', extraColumns: 'refused' })
  }

  onRow(cells: string[], row: number) {
    const header = this.header!
    const shape = rowShapeProblems(cells, header)
    for (const problem of shape) this.issues.add(row, problem.column, problem.message)
    if (shape.length) return
    const before = this.issues.count
    const problem = (column: string, message: string) => this.issues.add(row, column, message)
    const cell = (column: StockColumn): string | undefined => {
      const index = header.index(column)
      if (index < 0) return undefined
      const text = restoreCell(cells[index] ?? '').trim()
      const limit = LIMITS[column]
      if (limit !== undefined && text.length > limit) problem(column, `Keep ${column} under ${limit} characters.`)
      return text
    }
    const optional = <T>(column: StockColumn, read: (text: string) => T): T | undefined => {
      const text = cell(column)
      return text === undefined ? undefined : read(text)
    }
    const required = (column: StockColumn) => {
      const text = cell(column) ?? ''
      if (!text) problem(column, `${column} is required.`)
      return text
    }
    const partNumber = required('part_number')
    const site = required('site')
    const conditionText = required('condition')
    const priceText = required('price')
    const { condition, grade } = conditionText ? parseCondition(conditionText, problem) : { condition: 'new' as const, grade: null }
    const given: StockGiven = {
      partNumber,
      site,
      condition,
      grade,
      priceCents: priceText ? parseMoney(priceText, 'price', problem) : 0,
      coreChargeCents: optional('core_charge', (text) => (text ? parseMoney(text, 'core_charge', problem) : 0)),
      location: cell('location'),
      mileageKm: optional('mileage_km', (text) => parseWhole(text, 'mileage_km', { min: 0, max: 5_000_000 }, problem)),
      donorVin: optional('donor_vin', (text) => parseDonorVin(text, problem)),
      donorYear: optional('donor_year', (text) => parseWhole(text, 'donor_year', { min: 1950, max: 2100 }, problem)),
      status: optional('status', (text) => parseStatus(text, problem)),
      damageNotes: cell('notes'),
      label: optional('label', (text) => text || null),
    }
    if (this.issues.count > before) return
    this.keep(given, row)
  }

  private keep(given: StockGiven, row: number) {
    const fingerprint = JSON.stringify(given)
    if (!given.label) {
      this.unlabelled.push({ rows: [row], given, fingerprint })
      return
    }
    const { label } = given
    if (this.conflicting.has(label)) {
      this.issues.add(row, 'label', `Label ${label} appears more than once with different values.`)
      return
    }
    const first = this.labelled.get(label)
    if (!first) {
      this.labelled.set(label, { rows: [row], given, fingerprint })
      return
    }
    if (first.fingerprint === fingerprint) {
      first.rows.push(row)
      return
    }
    for (const earlier of first.rows) this.issues.add(earlier, 'label', `Label ${label} is also on row ${row} with different values.`)
    this.issues.add(row, 'label', `Label ${label} is also on row ${first.rows[0]!} with different values.`)
    this.conflicting.add(label)
    this.labelled.delete(label)
  }

  entries(): StockEntry[] {
    return [...this.labelled.values(), ...this.unlabelled]
  }
}
