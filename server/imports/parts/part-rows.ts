import type { PartInput } from '../../../shared/schemas/part-input'
import { normalisePartCode } from '../../../shared/schemas/part'
import { restoreCell } from '../../../shared/csv-cells'
import { parsePartRow, partCells } from '../csv/part-row'
import { readHeader, rowShapeProblems, type Header } from '../import-header'
import { RowIssues } from '../import-issues'

export type PartEntry = { rows: number[]; part: PartInput; fingerprint: string }

const sortedEntries = (record: Record<string, unknown>) => Object.entries(record).sort(([a], [b]) => (a < b ? -1 : a > b ? 1 : 0))

/** Everything about a part but its number, in a form two parts compare equal by. */
export function partFingerprint(part: PartInput): string {
  const marks = part.marks.map((mark) => `${mark.type}:${mark.value}`).sort()
  return JSON.stringify([
    part.kind,
    part.name,
    part.family,
    part.yearFrom,
    part.yearTo,
    part.notes,
    sortedEntries(part.attributes),
    marks,
    part.listPriceCents,
  ])
}

/** A list cell may name a mark twice; the catalogue keeps it once. */
function withUniqueMarks(part: PartInput): PartInput {
  const seen = new Set<string>()
  const marks = part.marks.filter((mark) => {
    const key = `${mark.type}:${mark.value}`
    if (seen.has(key)) return false
    seen.add(key)
    return true
  })
  return { ...part, marks }
}

function differingColumns(a: PartInput, b: PartInput): string[] {
  const left = partCells(a)
  const right = partCells(b)
  return [...new Set([...Object.keys(left), ...Object.keys(right)])].filter((column) => (left[column] ?? '') !== (right[column] ?? ''))
}

/**
 * The rows of a parts file, checked on their own (the catalogue is not read
 * yet): each row is parsed by parsePartRow, and a number that appears twice
 * must carry the same values both times. Part numbers that differ only in case
 * or punctuation are the same number to the counter, so they count as one.
 */
export class PartRows {
  header: Header | null = null
  readonly issues = new RowIssues()
  private readonly byKey = new Map<string, PartEntry>()
  private readonly conflicting = new Set<string>()

  onHeader(cells: string[], row: number) {
    this.header = readHeader(cells, row, { type: 'parts', extraColumns: 'allowed' })
  }

  onRow(cells: string[], row: number) {
    const header = this.header!
    const shape = rowShapeProblems(cells, header)
    for (const problem of shape) this.issues.add(row, problem.column, problem.message)
    if (shape.length) return
    const record: Record<string, string> = {}
    header.columns.forEach((column, index) => {
      if (column) record[column] = restoreCell(cells[index] ?? '')
    })
    const result = parsePartRow(record)
    if (!result.ok) {
      for (const error of result.errors) this.issues.add(row, error.column, error.message)
      return
    }
    this.keep(withUniqueMarks(result.part), row)
  }

  private keep(part: PartInput, row: number) {
    const key = normalisePartCode(part.partNumber)
    if (this.conflicting.has(key)) {
      this.issues.add(row, 'part_number', `Part ${part.partNumber} appears more than once with different values.`)
      return
    }
    const fingerprint = partFingerprint(part)
    const first = this.byKey.get(key)
    if (!first) {
      this.byKey.set(key, { rows: [row], part, fingerprint })
      return
    }
    if (first.part.partNumber === part.partNumber && first.fingerprint === fingerprint) {
      first.rows.push(row)
      return
    }
    const describe = (self: PartInput, other: PartInput, otherRow: number) =>
      self.partNumber === other.partNumber
        ? `Part ${self.partNumber} is also on row ${otherRow} with different values (${differingColumns(self, other).join(', ')}).`
        : `Part number "${self.partNumber}" is the same as "${other.partNumber}" on row ${otherRow} once case and punctuation are ignored.`
    for (const earlier of first.rows) this.issues.add(earlier, 'part_number', describe(first.part, part, row))
    this.issues.add(row, 'part_number', describe(part, first.part, first.rows[0]!))
    this.conflicting.add(key)
    this.byKey.delete(key)
  }

  /** The parts that passed, one entry per number (repeats of the same values folded in). */
  entries(): PartEntry[] {
    return [...this.byKey.values()]
  }
}
