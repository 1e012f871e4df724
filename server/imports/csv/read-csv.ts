import Papa from 'papaparse'
import { normaliseHeader } from '../../../shared/import-files'

export type CsvTable = { headers: string[]; rows: Record<string, string>[] }

export { normaliseHeader }

/** Parses a whole CSV text with a header row (delimiter detected, BOM dropped). */
export function readCsvText(text: string): CsvTable {
  const config: Papa.ParseConfig<Record<string, string>> = {
    header: true,
    skipEmptyLines: 'greedy',
    transformHeader: normaliseHeader,
    delimitersToGuess: [',', ';', '\t'],
  }
  const result = Papa.parse<Record<string, string>>(text.replace(/^\uFEFF/, ''), config)
  return { headers: result.meta.fields ?? [], rows: result.data }
}
