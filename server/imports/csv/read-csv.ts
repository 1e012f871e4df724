import Papa from 'papaparse'

export type CsvTable = { headers: string[]; rows: Record<string, string>[] }

/** Header names as the importers compare them: trimmed, lower case, spaces as underscores. */
export function normaliseHeader(header: string): string {
  return header
    .replace(/^\uFEFF/, '')
    .trim()
    .toLowerCase()
    .replace(/\s+/g, '_')
}

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
