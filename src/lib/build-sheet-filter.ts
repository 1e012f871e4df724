import { SLOT_IDS } from '@shared/build-template'
import type { BuildSheet } from '@shared/schemas/build'
import { normalisePartCode } from '@shared/schemas/part'

export const COMPLETENESS = ['all', 'complete', 'gaps'] as const
export type Completeness = (typeof COMPLETENESS)[number]
export type SheetFilter = { text: string; completeness: Completeness }

export const COMPLETENESS_LABELS: Record<Completeness, string> = {
  all: 'All sheets',
  complete: 'Every slot filled',
  gaps: 'With empty slots',
}

const filledSlots = (sheet: BuildSheet) => Object.values(sheet.slots).filter(Boolean).length

/** Whether a sheet's name, notes or one of its part numbers (spelt any way: "tm hd 2000") holds the text. */
function matchesText(sheet: BuildSheet, text: string): boolean {
  const words = text.trim().toLowerCase()
  if (!words) return true
  if (sheet.name.toLowerCase().includes(words) || sheet.notes.toLowerCase().includes(words)) return true
  const code = normalisePartCode(text)
  return code !== '' && Object.values(sheet.slots).some((partNumber) => normalisePartCode(partNumber).includes(code))
}

/** The sheets a search and the completeness filter leave, in the list's order. */
export function filterSheets(sheets: readonly BuildSheet[], filter: SheetFilter): BuildSheet[] {
  return sheets.filter((sheet) => {
    if (!matchesText(sheet, filter.text)) return false
    if (filter.completeness === 'complete') return filledSlots(sheet) === SLOT_IDS.length
    if (filter.completeness === 'gaps') return filledSlots(sheet) < SLOT_IDS.length
    return true
  })
}
