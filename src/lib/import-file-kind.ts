import Papa from 'papaparse'
import { IMPORT_FILES, guessImportType, normaliseHeader } from '@shared/import-files'
import type { ImportType } from '@shared/schemas/imports'

/** The first row of a CSV text as cells (delimiter detected as the importer detects it). */
export function headerCells(text: string): string[] {
  const firstLines = text.replace(/^\uFEFF/, '').slice(0, 64 * 1024)
  const config: Papa.ParseConfig<string[]> = { preview: 1, delimitersToGuess: [',', ';', '\t'] }
  return Papa.parse<string[]>(firstLines, config).data[0] ?? []
}

export type FileKindHint = { looksLike: ImportType; message: string }

/**
 * Warns before upload when a file's header is plainly of another kind than the
 * one chosen, as the server would refuse it: all the columns that kind
 * requires are there, and the chosen kind's are not.
 */
export function fileKindHint(header: string[], chosen: ImportType): FileKindHint | null {
  const guess = guessImportType(header)
  if (!guess?.complete || guess.type === chosen) return null
  const names = new Set(header.map(normaliseHeader))
  if (IMPORT_FILES[chosen].required.every((column) => names.has(column))) return null
  const other = IMPORT_FILES[guess.type].file
  return { looksLike: guess.type, message: `This looks like a ${other}, not a ${IMPORT_FILES[chosen].file}.` }
}
