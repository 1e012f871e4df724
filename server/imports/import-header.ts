import type { ImportType } from '../../shared/schemas/imports'
import { IMPORT_FILES, guessImportType, normaliseHeader } from '../../shared/import-files'
import { AppError } from '../errors/app-error'
import { issueDetails } from './import-issues'

export type HeaderSpec = {
  /** The kind of file expected; its columns come from IMPORT_FILES, and a header of another kind is named as such. */
  type: ImportType
  /** Whether columns beyond the known ones are allowed (a parts file's attributes) or refused. */
  extraColumns: 'allowed' | 'refused'
}

export type Header = {
  /** Normalised names by position; '' for a column without a name. */
  columns: string[]
  /** Positions of columns without a name. */
  unnamed: number[]
  has: (column: string) => boolean
  index: (column: string) => number
}

/** Names that would reach into an object's prototype when used as an attribute key. */
const RESERVED_COLUMNS: ReadonlySet<string> = new Set(['__proto__', 'constructor', 'prototype'])

/**
 * Reads and checks the header row. A problem here is a problem with the whole
 * file, so it stops the import with a 400 that names row and column.
 */
export function readHeader(cells: string[], row: number, { type, extraColumns }: HeaderSpec): Header {
  const spec = IMPORT_FILES[type]
  const columns = cells.map(normaliseHeader)
  const problems: { column: string; message: string }[] = []
  const seen = new Set<string>()
  for (const column of columns) {
    if (!column) continue
    if (RESERVED_COLUMNS.has(column)) {
      problems.push({ column, message: `Column "${column}" cannot be used as a column name; rename it.` })
    }
    if (seen.has(column)) problems.push({ column, message: `Column "${column}" appears twice.` })
    seen.add(column)
  }
  const namesNone = !spec.known.some((column) => seen.has(column))
  const lacksRequired = spec.required.some((column) => !seen.has(column))
  const guess = namesNone || lacksRequired ? guessImportType(seen) : null
  if (guess?.complete && guess.type !== type) {
    const other = IMPORT_FILES[guess.type].file
    const message = `Row ${row} looks like the header of a ${other}, not a ${spec.file}. Upload it as a ${other}, or choose a ${spec.file}.`
    throw new AppError(400, 'wrong_file', message, issueDetails([{ row, column: '', message }]))
  }
  if (namesNone) {
    throw new AppError(
      400,
      'missing_header',
      `Row ${row} is not a header row. The first row must name the columns: ${spec.known.join(', ')}.`,
      issueDetails([{ row, column: '', message: 'No header row.' }]),
    )
  }
  for (const column of spec.required) {
    if (!seen.has(column)) problems.push({ column, message: `Required column "${column}" is missing.` })
  }
  if (extraColumns === 'refused') {
    for (const column of seen) {
      if (!spec.known.includes(column)) {
        problems.push({ column, message: `Unknown column "${column}"; this file takes ${spec.known.join(', ')}.` })
      }
    }
  }
  if (problems.length) {
    const issues = problems.map((problem) => ({ row, ...problem }))
    throw new AppError(400, 'invalid_header', `Row ${row}: ${problems[0]!.message}`, issueDetails(issues))
  }
  const positions = new Map(columns.map((column, index) => [column, index] as const).filter(([column]) => column))
  return {
    columns,
    unnamed: columns.flatMap((column, index) => (column ? [] : [index])),
    has: (column) => positions.has(column),
    index: (column) => positions.get(column) ?? -1,
  }
}

/**
 * Row-shape problems: more cells than the header names (usually a comma that
 * should have been quoted) or a value under a column without a name. Fewer
 * cells are fine: the missing ones read as empty, as spreadsheets write them.
 */
export function rowShapeProblems(cells: string[], header: Header): { column: string; message: string }[] {
  if (cells.length <= header.columns.length && header.unnamed.length === 0) return NO_PROBLEMS
  const problems: { column: string; message: string }[] = []
  if (cells.length > header.columns.length && cells.slice(header.columns.length).some((cell) => cell.trim())) {
    problems.push({
      column: '',
      message: `This row has ${cells.length} cells but the header names ${header.columns.length} columns; quote cells that contain the delimiter.`,
    })
  }
  for (const index of header.unnamed) {
    if ((cells[index] ?? '').trim()) {
      problems.push({ column: `column ${index + 1}`, message: 'This value is under a column without a name in the header.' })
    }
  }
  return problems
}
const NO_PROBLEMS: { column: string; message: string }[] = []
