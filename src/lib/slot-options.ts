import type { SlotId } from '@shared/build-template'
import type { Candidate } from '@shared/schemas/build'
import { normalisePartCode, type Part } from '@shared/schemas/part'
import { PART_KIND_LABELS } from '@shared/schemas/part-kinds'
import type { Relation } from '@shared/schemas/fitment'
import type { Availability } from '@shared/schemas/stock'

export type SlotOption = {
  part: Part
  suggested: boolean
  relation?: Relation
  modifications: string[]
  reasons: string[]
  /** What is on the shelf; only suggestions carry it (a searched part is not checked against the shelf here). */
  stock?: Availability
  /** Said beside a part that was searched for but is not among the suggestions. */
  note?: string
}
export type SlotOptionGroup = { label: string; items: SlotOption[] }

function matches(part: Part, query: string): boolean {
  const key = normalisePartCode(query)
  const text = query.trim().toLowerCase()
  if (!text) return true
  return (
    (key !== '' && [part.partNumber, ...part.marks.map((mark) => mark.value)].some((code) => normalisePartCode(code).includes(key))) ||
    part.name.toLowerCase().includes(text) ||
    part.family.toLowerCase().includes(text)
  )
}

/**
 * A slot picker's choices: first the parts that fit every chosen part they
 * mate with (the server's candidates, best first), then any other part of the
 * kind that matches the search, marked as not checked against the build.
 */
export function slotOptionGroups(slot: SlotId, query: string, candidates: readonly Candidate[], found: readonly Part[]): SlotOptionGroup[] {
  const suggested = candidates
    .filter((candidate) => matches(candidate.part, query))
    .map((c): SlotOption => ({
      part: c.part,
      suggested: true,
      relation: c.relation,
      modifications: c.modifications,
      reasons: c.reasons,
      stock: c.stock,
    }))
  const taken = new Set(candidates.map((candidate) => candidate.part.partNumber))
  const others = found
    .filter((part) => !taken.has(part.partNumber))
    .map((part): SlotOption => ({
      part,
      suggested: false,
      modifications: [],
      reasons: [],
      note: candidates.length ? 'not suggested' : undefined,
    }))
  const kind = PART_KIND_LABELS[slot].toLowerCase()
  return [
    { label: 'Fit the parts already chosen', items: suggested },
    { label: candidates.length ? `Other ${kind} parts: not suggested, checked once chosen` : `All matching ${kind} parts`, items: others },
  ].filter((group) => group.items.length > 0)
}

/**
 * What Enter takes when the text in a picker was typed (or arrived whole from a
 * scanner or autofill) rather than chosen: the option with exactly that number,
 * else the text itself when the list on show answers an older search. Null
 * leaves Enter to the list (the highlighted option), as for a partial number.
 */
export function typedChoice(typed: string, groups: readonly SlotOptionGroup[], answeredQuery: string | null): string | null {
  const key = normalisePartCode(typed)
  if (!key) return null
  const exact = groups.flatMap((group) => group.items).find((option) => normalisePartCode(option.part.partNumber) === key)
  if (exact) return exact.part.partNumber
  return answeredQuery === null || normalisePartCode(answeredQuery) !== key ? typed.trim() : null
}
