import { SLOT_IDS, type SlotId } from './build-template'
import type { ImportType } from './schemas/imports'

/*
 * The columns of each import file. Both sides read them: the server checks a
 * header against them, and the client tells an editor which kind of file they
 * chose before it is sent.
 */

export const PART_FILE_COLUMNS = ['part_number', 'kind', 'name', 'family', 'year_from', 'year_to', 'notes'] as const
export const PART_MARK_COLUMNS = ['casting_marks', 'stamped_codes', 'superseded_numbers'] as const
/** Optional: the price a quote charges for the part when no unit is on a shelf, a decimal in the shop's currency. */
export const PART_LIST_PRICE_COLUMN = 'list_price'
export const LINK_COLUMNS = ['from_part', 'to_part', 'relation', 'modifications', 'note', 'source'] as const

/** A slot's column in a vehicles file: the slot id with underscores (`head_gasket`). */
export const slotColumn = (slot: SlotId): string => slot.replace(/-/g, '_')
export const VEHICLE_SLOT_COLUMNS: readonly string[] = SLOT_IDS.map(slotColumn)
export const VEHICLE_COLUMNS = ['year_from', 'year_to', 'make', 'model', 'body', 'market', 'engine_family'] as const
export const REQUIRED_VEHICLE_COLUMNS = ['year_from', 'year_to', 'make', 'model', 'engine_family'] as const

export const STOCK_COLUMNS = [
  'part_number',
  'site',
  'condition',
  'price',
  'core_charge',
  'location',
  'mileage_km',
  'donor_vin',
  'donor_year',
  'status',
  'notes',
  'label',
] as const
export const REQUIRED_STOCK_COLUMNS = ['part_number', 'site', 'condition', 'price'] as const

export type ImportFileSpec = {
  /** What the editor calls it: "a stock file". */
  file: string
  required: readonly string[]
  known: readonly string[]
}

export const IMPORT_FILES: Readonly<Record<ImportType, ImportFileSpec>> = {
  parts: {
    file: 'parts file',
    required: ['part_number', 'kind', 'name'],
    known: [...PART_FILE_COLUMNS, PART_LIST_PRICE_COLUMN, ...PART_MARK_COLUMNS],
  },
  links: { file: 'links file', required: ['from_part', 'to_part', 'relation'], known: LINK_COLUMNS },
  vehicles: { file: 'vehicles file', required: REQUIRED_VEHICLE_COLUMNS, known: [...VEHICLE_COLUMNS, ...VEHICLE_SLOT_COLUMNS] },
  stock: { file: 'stock file', required: REQUIRED_STOCK_COLUMNS, known: STOCK_COLUMNS },
}

/** Header names as the importers compare them: trimmed, lower case, spaces as underscores. */
export function normaliseHeader(header: string): string {
  return header
    .replace(/^\uFEFF/, '')
    .trim()
    .toLowerCase()
    .replace(/\s+/g, '_')
}

/**
 * Which kind of file a header most looks like: a kind whose required columns
 * are all there wins (the one naming most of its columns, if several), else
 * the kind naming most of its columns; null when it names none of any kind.
 */
export function guessImportType(columns: Iterable<string>): { type: ImportType; complete: boolean } | null {
  const names = new Set([...columns].map(normaliseHeader))
  let best: { type: ImportType; complete: boolean; score: number } | null = null
  for (const [type, spec] of Object.entries(IMPORT_FILES) as [ImportType, ImportFileSpec][]) {
    const score = spec.known.filter((column) => names.has(column)).length
    if (score === 0) continue
    const complete = spec.required.every((column) => names.has(column))
    if (!best || (complete && !best.complete) || (complete === best.complete && score > best.score)) best = { type, complete, score }
  }
  return best && { type: best.type, complete: best.complete }
}
