import type { Database } from '../../db/database'
import type { FieldChange, ImportIssue } from '../../../shared/schemas/imports'
import type { MarkType } from '../../../shared/schemas/part'
import type { PartInput } from '../../../shared/schemas/part-input'
import type { PartKind } from '../../../shared/schemas/part-kinds'
import { normalisePartCode } from '../../../shared/schemas/part'
import { LIST_PRICE_COLUMN, MARK_COLUMNS, attributeKeyForColumn, checkPart, isAttributeColumn, partCells } from '../csv/part-row'
import { ChangeList } from '../import-change-list'
import type { Header } from '../import-header'
import { partFingerprint, type PartEntry, type PartRows } from './part-rows'

export type PartRecord = {
  id: number
  partNumber: string
  partKey: string
  kind: PartKind
  name: string
  family: string
  yearFrom: number | null
  yearTo: number | null
  notes: string
  attributes: string
  listPriceCents: number | null
  batchId: number | null
  createdAt: string | Date
  updatedAt: string | Date
}
export type MarkRecord = { id: number; partId: number; type: MarkType; value: string; valueKey: string }

export type PartUpdate = { id: number; part: PartInput; previous: { part: PartRecord; marks: MarkRecord[] } }

export type PartsPlan = {
  changes: ChangeList
  issues: ImportIssue[]
  creates: PartInput[]
  updates: PartUpdate[]
}

const MARK_COLUMN_OF = Object.fromEntries(Object.entries(MARK_COLUMNS).map(([column, type]) => [type, column])) as Record<MarkType, string>

function storedPart(record: PartRecord, marks: MarkRecord[]): PartInput {
  return {
    partNumber: record.partNumber,
    kind: record.kind,
    name: record.name,
    family: record.family,
    yearFrom: record.yearFrom,
    yearTo: record.yearTo,
    notes: record.notes,
    attributes: JSON.parse(record.attributes) as PartInput['attributes'],
    marks: marks.map((mark) => ({ type: mark.type, value: mark.value })),
    listPriceCents: record.listPriceCents,
  }
}

/** A column the file does not have leaves that value as the catalogue has it; an empty cell clears it. */
function mergeAbsentColumns(stored: PartInput, incoming: PartInput, header: Header): PartInput {
  const keep = (column: string) => !header.has(column)
  const covered = new Set(
    header.columns.filter((column) => column && isAttributeColumn(column)).map((column) => attributeKeyForColumn(incoming.kind, column)),
  )
  const keptAttributes = Object.entries(stored.attributes).filter(([key]) => !covered.has(key))
  return {
    ...incoming,
    family: keep('family') ? stored.family : incoming.family,
    yearFrom: keep('year_from') ? stored.yearFrom : incoming.yearFrom,
    yearTo: keep('year_to') ? stored.yearTo : incoming.yearTo,
    notes: keep('notes') ? stored.notes : incoming.notes,
    listPriceCents: keep(LIST_PRICE_COLUMN) ? stored.listPriceCents : incoming.listPriceCents,
    attributes: { ...Object.fromEntries(keptAttributes), ...incoming.attributes },
    marks: [...stored.marks.filter((mark) => keep(MARK_COLUMN_OF[mark.type])), ...incoming.marks],
  }
}

function fieldChanges(before: PartInput | null, after: PartInput): FieldChange[] {
  const left = before ? partCells(before) : {}
  const right = partCells(after)
  return [...new Set([...Object.keys(left), ...Object.keys(right)])]
    .filter((field) => field !== 'part_number' && (left[field] ?? '') !== (right[field] ?? ''))
    .map((field) => ({ field, before: left[field] ?? '', after: right[field] ?? '' }))
}

/**
 * Weighs the checked rows against the catalogue as it is now: a new number is
 * created, a known one updated when anything differs, left alone otherwise.
 * At commit it runs in the write's transaction, so nothing changes between plan and write.
 */
export async function planParts(db: Database, rows: PartRows): Promise<PartsPlan> {
  // Row by row through the number, key and mark indexes: the work follows the file, not the catalogue.
  const partByNumber = (number: string) => db.get<PartRecord>('SELECT * FROM part WHERE "partNumber" = ?', [number])
  const partByKey = (key: string) => db.get<PartRecord>('SELECT * FROM part WHERE "partKey" = ? ORDER BY "partNumber" LIMIT 1', [key])
  const marksOf = (id: number) => db.all<MarkRecord>('SELECT * FROM part_mark WHERE "partId" = ? ORDER BY "id"', [id])
  const header = rows.header!
  const plan: PartsPlan = { changes: new ChangeList(), issues: [], creates: [], updates: [] }
  const issues = rows.issues.clone()
  const reject = (entry: PartEntry, column: string, message: string) => {
    for (const row of entry.rows) issues.add(row, column, message)
  }

  for (const entry of rows.entries()) {
    const { part } = entry
    const [firstRow] = entry.rows as [number]
    const record = await partByNumber(part.partNumber)
    if (!record) {
      const sameKey = await partByKey(normalisePartCode(part.partNumber))
      if (sameKey) {
        reject(
          entry,
          'part_number',
          `"${part.partNumber}" is part ${sameKey.partNumber} in the catalogue once case and punctuation are ignored; write it as ${sameKey.partNumber}.`,
        )
        continue
      }
      plan.creates.push(part)
      plan.changes.repeats(entry.rows.length - 1)
      plan.changes.create(firstRow, part.partNumber, () => fieldChanges(null, part))
      continue
    }
    const marks = await marksOf(record.id)
    const stored = storedPart(record, marks)
    const checked = checkPart(mergeAbsentColumns(stored, part, header))
    if (!checked.ok) {
      for (const error of checked.errors)
        reject(entry, error.column, `${error.message} (with the catalogue's values for columns this file does not have)`)
      continue
    }
    const merged = checked.part
    plan.changes.repeats(entry.rows.length - 1)
    if (partFingerprint(merged) === partFingerprint(stored)) {
      plan.changes.compare(firstRow, part.partNumber, [])
      continue
    }
    plan.updates.push({ id: record.id, part: merged, previous: { part: record, marks } })
    const fields = fieldChanges(stored, merged)
    // Same text, different type (a number stored as text by an older writer): still worth writing.
    plan.changes.compare(firstRow, part.partNumber, fields.length ? fields : [{ field: 'attributes', before: 'as stored', after: 'typed' }])
  }
  plan.changes.rejected(issues.count)
  plan.issues = issues.sorted()
  return plan
}
