import Papa from 'papaparse'
import { neutraliseCell } from '@shared/csv-cells'
import type { PartsListLine } from '@shared/schemas/build'
import { shelfCsvText } from './parts-list-shelf'

const CATEGORY_LABELS: Record<PartsListLine['category'], string> = {
  chosen: 'Chosen part',
  modification: 'For a modification',
  consumable: 'Consumable',
}

export const PARTS_LIST_COLUMNS = ['Part number', 'Description', 'Quantity', 'Unit', 'From the shelf', 'Category', 'Reason'] as const

/** The build's full parts list as CSV text, every text cell neutralised. */
export function partsListCsv(lines: readonly PartsListLine[]): string {
  const rows = lines.map((line) => [
    neutraliseCell(line.partNumber ?? ''),
    neutraliseCell(line.description),
    line.quantity,
    neutraliseCell(line.unit),
    neutraliseCell(shelfCsvText(line)),
    CATEGORY_LABELS[line.category],
    neutraliseCell(line.reason),
  ])
  return Papa.unparse({ fields: [...PARTS_LIST_COLUMNS], data: rows }, { quotes: true, newline: '\r\n' })
}

export function categoryLabel(category: PartsListLine['category']): string {
  return CATEGORY_LABELS[category]
}

/** A file name from the build's name: letters, digits and dashes only. */
export function partsListFileName(buildName: string): string {
  const slug = buildName
    .toLowerCase()
    .replace(/[^a-z0-9]+/g, '-')
    .replace(/^-+|-+$/g, '')
    .slice(0, 60)
  return `${slug || 'build'}-parts-list.csv`
}
