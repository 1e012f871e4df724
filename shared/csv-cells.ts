import Papa from 'papaparse'

/*
 * Spreadsheets run a cell that starts with = + - @ tab or carriage return as a
 * formula (CSV injection). Following OWASP's guidance, the export puts a single
 * quote before such a cell so it reads as text. The import takes that quote off
 * again; a value that itself starts with a quote followed by one of those
 * characters (or another quote) gets one more on export, so every value comes
 * back exactly.
 */
const FORMULA_START = /^[=+\-@\t\r]/
const ESCAPED_START = /^'[=+\-@\t\r']/

export function neutraliseCell(value: string): string {
  return FORMULA_START.test(value) || ESCAPED_START.test(value) ? `'${value}` : value
}

export function restoreCell(value: string): string {
  // The character test first: this runs for every cell of a large import.
  return value.charCodeAt(0) === 39 && ESCAPED_START.test(value) ? value.slice(1) : value
}

/** Rows as RFC 4180 CSV text (CRLF line ends, quotes only where needed), every cell neutralised. */
export function toCsv(rows: string[][]): string {
  return Papa.unparse(
    rows.map((cells) => cells.map(neutraliseCell)),
    { newline: '\r\n', escapeFormulae: false },
  )
}

/** Excel reads a UTF-8 CSV as UTF-8 only when it starts with a byte-order mark. */
export const UTF8_BOM = '\uFEFF'
