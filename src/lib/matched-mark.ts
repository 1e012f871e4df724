import { normalisePartCode, type Part, type PartMark } from '@shared/schemas/part'

/** The mark a search matched, when it was not the part number itself (shown beside a suggestion). */
export function matchedMark(part: Part, query: string): PartMark | null {
  const key = normalisePartCode(query)
  if (!key || normalisePartCode(part.partNumber).includes(key)) return null
  return part.marks.find((mark) => normalisePartCode(mark.value).includes(key)) ?? null
}

export const MARK_WORDS: Record<PartMark['type'], string> = { casting: 'casting', stamped: 'stamped', superseded: 'replaces' }
