import { LINK_SOURCES, RELATIONS, type LinkSource, type Relation } from '../../../shared/schemas/fitment'
import { restoreCell } from '../../../shared/csv-cells'
import { splitList } from '../csv/part-row'
import { readHeader, rowShapeProblems, type Header } from '../import-header'
import { RowIssues } from '../import-issues'

export { LINK_COLUMNS } from '../../../shared/import-files'
export const LINK_FILE_RELATIONS = [...RELATIONS, 'identical'] as const
export type LinkFileRelation = (typeof LINK_FILE_RELATIONS)[number]

const MODIFICATION_NAME = /^[a-z0-9]+(?:-[a-z0-9]+)*$/
const relations = new Set<string>(LINK_FILE_RELATIONS)
const sources = new Set<string>(LINK_SOURCES)

/** One pair of a links file. Null for a column the file does not have: the catalogue's value stays. */
export type LinkEntry = {
  row: number
  /** Later rows that repeat the pair with the same values. */
  repeats: number[] | null
  from: string
  to: string
  relation: LinkFileRelation
  modifications: string[] | null
  note: string | null
  source: LinkSource | null
}

export const rowsOf = (entry: LinkEntry) => (entry.repeats ? [entry.row, ...entry.repeats] : [entry.row])

function sameValues(a: LinkEntry, b: LinkEntry): boolean {
  return (
    a.relation === b.relation &&
    a.note === b.note &&
    a.source === b.source &&
    (a.modifications === null
      ? b.modifications === null
      : b.modifications !== null && a.modifications.join(';') === b.modifications.join(';'))
  )
}

/** A cell of an optional column; null when the file does not have the column. */
function optionalCell(cells: string[], index: number): string | null {
  return index < 0 ? null : restoreCell(cells[index] ?? '')
}

export const isFitRelation = (relation: LinkFileRelation): relation is Relation => relation !== 'identical'

/**
 * The rows of a links file, checked on their own (parts are looked up later,
 * against the catalogue). Fit is mutual, so a pair is the same pair in either
 * order; a pair named twice must say the same both times.
 */
export class LinkRows {
  header: Header | null = null
  readonly issues = new RowIssues()
  private readonly byPair = new Map<string, LinkEntry>()
  private readonly conflicting = new Set<string>()
  private at = { from: 0, to: 0, relation: 0, modifications: -1, note: -1, source: -1 }

  onHeader(cells: string[], row: number) {
    const header = readHeader(cells, row, { type: 'links', extraColumns: 'refused' })
    this.header = header
    this.at = {
      from: header.index('from_part'),
      to: header.index('to_part'),
      relation: header.index('relation'),
      modifications: header.index('modifications'),
      note: header.index('note'),
      source: header.index('source'),
    }
  }

  /** Runs once per row of files with 100,000 rows and more, so it avoids work a valid row does not need. */
  onRow(cells: string[], row: number) {
    const issues = this.issues
    const shape = rowShapeProblems(cells, this.header!)
    for (const problem of shape) issues.add(row, problem.column, problem.message)
    if (shape.length) return
    const at = this.at
    const from = restoreCell(cells[at.from] ?? '').trim()
    const to = restoreCell(cells[at.to] ?? '').trim()
    const relation = restoreCell(cells[at.relation] ?? '')
      .trim()
      .toLowerCase()
    const modificationsCell = optionalCell(cells, at.modifications)
    const sourceCell = optionalCell(cells, at.source)?.trim().toLowerCase() ?? null
    const note = optionalCell(cells, at.note)
    const rejectedBefore = issues.count

    if (!from) issues.add(row, 'from_part', 'from_part is required.')
    if (!to) issues.add(row, 'to_part', 'to_part is required.')
    if (from && from === to) issues.add(row, 'to_part', `A part cannot be linked to itself (${from}).`)
    if (!relations.has(relation)) {
      const message = relation
        ? `Unknown relation "${relation}"; use ${LINK_FILE_RELATIONS.join(', ')}.`
        : `Relation is required: ${LINK_FILE_RELATIONS.join(', ')}.`
      issues.add(row, 'relation', message)
    }
    let modifications: string[] | null = null
    if (modificationsCell !== null) {
      modifications = modificationsCell.trim() ? [...new Set(splitList(modificationsCell).map((name) => name.toLowerCase()))].sort() : []
      for (const name of modifications) {
        if (!MODIFICATION_NAME.test(name) || name.length > 80) {
          issues.add(
            row,
            'modifications',
            `"${name}" is not a modification name; names are lower-case words joined by hyphens, like oil-restrictor-fit.`,
          )
        }
      }
    }
    if (sourceCell && !sources.has(sourceCell)) {
      issues.add(row, 'source', `Unknown source "${sourceCell}"; use ${LINK_SOURCES.join(', ')}, or leave it empty for import.`)
    }
    if (note !== null && note.length > 4000) issues.add(row, 'note', 'A note is at most 4000 characters.')
    if (issues.count > rejectedBefore) return

    const source = sourceCell === null ? null : ((sourceCell || 'import') as LinkSource)
    this.keep({
      row,
      repeats: null,
      from,
      to,
      relation: relation as LinkFileRelation,
      modifications,
      note,
      source,
    })
  }

  private keep(entry: LinkEntry) {
    // NUL cannot occur in the text (binary files are refused), so it cannot blur two pairs together.
    const pair = entry.from < entry.to ? `${entry.from}\u0000${entry.to}` : `${entry.to}\u0000${entry.from}`
    const { row } = entry
    if (this.conflicting.has(pair)) {
      this.issues.add(row, 'relation', `The pair ${entry.from} and ${entry.to} appears more than once with different values.`)
      return
    }
    const first = this.byPair.get(pair)
    if (!first) {
      this.byPair.set(pair, entry)
      return
    }
    if (sameValues(first, entry)) {
      ;(first.repeats ??= []).push(row)
      return
    }
    const differs = first.relation !== entry.relation ? 'a different relation' : 'different values'
    for (const earlier of rowsOf(first)) {
      this.issues.add(
        earlier,
        'relation',
        `The pair ${entry.from} and ${entry.to} is also on row ${row} with ${differs} (${entry.relation}).`,
      )
    }
    this.issues.add(
      row,
      'relation',
      `The pair ${entry.from} and ${entry.to} is also on row ${first.row} with ${differs} (${first.relation}).`,
    )
    this.conflicting.add(pair)
    this.byPair.delete(pair)
  }

  entries(): IterableIterator<LinkEntry> {
    return this.byPair.values()
  }
}
