import type { PartInput } from '../../../shared/schemas/part-input'
import { partInputSchema } from '../../../shared/schemas/part-input'
import { knownAttributes } from '../../../shared/schemas/part-attributes'
import type { MarkType } from '../../../shared/schemas/part'
import { PART_KINDS, type PartKind } from '../../../shared/schemas/part-kinds'
import { IMPORT_FILES, PART_FILE_COLUMNS, PART_LIST_PRICE_COLUMN } from '../../../shared/import-files'
import { centsToDecimal, decimalToCents } from '../../../shared/money'

/** Columns of the parts file that are not attributes. */
export const PART_COLUMNS = PART_FILE_COLUMNS
export const MARK_COLUMNS: Record<string, MarkType> = {
  casting_marks: 'casting',
  stamped_codes: 'stamped',
  superseded_numbers: 'superseded',
}
/** Optional: the price to quote when no unit is on a shelf, as a decimal in the shop's currency ("129.90"). */
export const LIST_PRICE_COLUMN = PART_LIST_PRICE_COLUMN
export const REQUIRED_PART_COLUMNS = IMPORT_FILES.parts.required

export type RowError = { column: string; message: string }
export type PartRowResult = { ok: true; part: PartInput } | { ok: false; errors: RowError[] }

export const snakeToCamel = (name: string) => name.replace(/_([a-z0-9])/g, (_, c: string) => c.toUpperCase())
export const camelToSnake = (name: string) => name.replace(/[A-Z]/g, (c) => `_${c.toLowerCase()}`)

const TRUE_WORDS = ['true', 'yes', 'y', '1']
const FALSE_WORDS = ['false', 'no', 'n', '0']

/** A list cell: values separated by semicolons. */
export function splitList(cell: string | undefined): string[] {
  return (cell ?? '')
    .split(';')
    .map((value) => value.trim())
    .filter(Boolean)
}

const LIST_PRICE_PROBLEMS = {
  negative: 'a list price cannot be negative',
  not_an_amount: 'write it like 129.90, without a currency sign',
  too_large: 'a list price is at most 1000000.00',
} as const

function parseListPrice(cell: string | undefined, errors: RowError[]): number | null {
  const text = (cell ?? '').trim()
  if (!text) return null
  const reading = decimalToCents(text)
  if (reading.ok) return reading.cents
  errors.push({ column: LIST_PRICE_COLUMN, message: `"${text}" is not a price: ${LIST_PRICE_PROBLEMS[reading.problem]}.` })
  return null
}

function parseYear(cell: string | undefined, column: string, errors: RowError[]): number | null {
  const text = (cell ?? '').trim()
  if (!text) return null
  if (!/^\d{4}$/.test(text)) {
    errors.push({ column, message: `"${text}" is not a four-digit year.` })
    return null
  }
  return Number(text)
}

/** Any column but the part's own fields and the mark lists holds an attribute. */
export function isAttributeColumn(column: string): boolean {
  return !(PART_COLUMNS as readonly string[]).includes(column) && column !== LIST_PRICE_COLUMN && !(column in MARK_COLUMNS)
}

const knownTypes = new Map(
  PART_KINDS.map((kind) => [kind, new Map(knownAttributes(kind).map((attribute) => [attribute.name, attribute.type]))]),
)

/** The attribute a column holds for a kind: the camelCase name when the kind knows it, else the header as written. */
export function attributeKeyForColumn(kind: PartKind, column: string): string {
  const camel = snakeToCamel(column)
  return knownTypes.get(kind)?.has(camel) ? camel : column
}

/** The column an attribute is written to, the inverse of attributeKeyForColumn. */
export function attributeColumn(kind: PartKind, key: string): string {
  return knownTypes.get(kind)?.has(key) ? camelToSnake(key) : key
}

function typedAttributes(kind: PartKind, row: Record<string, string>, errors: RowError[]) {
  const known = knownTypes.get(kind)!
  const attributes: Record<string, string | number | boolean> = {}
  for (const [column, rawValue] of Object.entries(row)) {
    if (!isAttributeColumn(column)) continue
    const value = (rawValue ?? '').trim()
    if (!value) continue
    const camel = snakeToCamel(column)
    const type = known.get(camel)
    if (!type) {
      attributes[column] = value
      continue
    }
    if (type === 'number') {
      const number = Number(value)
      if (!Number.isFinite(number)) errors.push({ column, message: `"${value}" is not a number.` })
      else attributes[camel] = number
    } else if (type === 'boolean') {
      const word = value.toLowerCase()
      if (TRUE_WORDS.includes(word)) attributes[camel] = true
      else if (FALSE_WORDS.includes(word)) attributes[camel] = false
      else errors.push({ column, message: `"${value}" is not true or false.` })
    } else {
      attributes[camel] = value
    }
  }
  return attributes
}

/**
 * Turns one row of a parts file (headers already lower-cased and trimmed) into a
 * part, or the row's errors, each naming its column.
 */
export function parsePartRow(row: Record<string, string>): PartRowResult {
  const errors: RowError[] = []
  const kindText = (row.kind ?? '').trim().toLowerCase()
  const knownKind = (PART_KINDS as readonly string[]).includes(kindText)
  if (!knownKind) errors.push({ column: 'kind', message: kindText ? `Unknown kind "${kindText}".` : 'Kind is required.' })
  // An unknown kind cannot type the attributes, but the row's other fields are still checked so that every problem shows at once.
  const kind = (knownKind ? kindText : PART_KINDS[0]) as PartKind
  const yearFrom = parseYear(row.year_from, 'year_from', errors)
  const yearTo = parseYear(row.year_to, 'year_to', errors)
  const listPriceCents = parseListPrice(row[LIST_PRICE_COLUMN], errors)
  const attributes = knownKind ? typedAttributes(kind, row, errors) : {}
  const marks = Object.entries(MARK_COLUMNS).flatMap(([column, type]) => splitList(row[column]).map((value) => ({ type, value })))
  const checked = checkPart({
    partNumber: row.part_number ?? '',
    kind,
    name: row.name ?? '',
    family: row.family ?? '',
    yearFrom,
    yearTo,
    notes: row.notes ?? '',
    attributes,
    marks,
    listPriceCents,
  })
  if (!checked.ok) {
    const reported = new Set(errors.map((error) => error.column))
    errors.push(...checked.errors.filter((error) => !reported.has(error.column)))
  }
  return errors.length ? { ok: false, errors } : checked
}

/** Checks a whole part against the shared schema, naming each problem by its column. */
export function checkPart(candidate: PartInput): PartRowResult {
  const parsed = partInputSchema.safeParse(candidate)
  if (parsed.success) return { ok: true, part: parsed.data }
  return {
    ok: false,
    errors: parsed.error.issues.map((issue) => {
      const [first, second] = issue.path.map(String)
      const column =
        first === 'attributes' && second
          ? attributeColumn(candidate.kind, second)
          : first === 'listPriceCents'
            ? LIST_PRICE_COLUMN
            : camelToSnake(first ?? 'row')
      return { column, message: issue.message }
    }),
  }
}

function cellText(value: string | number | boolean | null): string {
  if (value === null) return ''
  return typeof value === 'string' ? value : String(value)
}

/** A part as the cells of a parts file, column by column: the inverse of parsePartRow. */
export function partCells(part: PartInput): Record<string, string> {
  const cells: Record<string, string> = {
    part_number: part.partNumber,
    kind: part.kind,
    name: part.name,
    family: part.family,
    year_from: cellText(part.yearFrom),
    year_to: cellText(part.yearTo),
    notes: part.notes,
    [LIST_PRICE_COLUMN]: part.listPriceCents === null ? '' : centsToDecimal(part.listPriceCents),
  }
  for (const [column, type] of Object.entries(MARK_COLUMNS)) {
    cells[column] = part.marks
      .filter((mark) => mark.type === type)
      .map((mark) => mark.value)
      .join('; ')
  }
  for (const [key, value] of Object.entries(part.attributes)) cells[attributeColumn(part.kind, key)] = cellText(value)
  return cells
}
