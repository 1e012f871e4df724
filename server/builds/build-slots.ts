import { BUILD_SLOTS, isSlotId, type SlotId } from '../../shared/build-template'
import type { FieldError } from '../../shared/schemas/errors'
import { PART_KIND_LABELS } from '../../shared/schemas/part-kinds'
import type { PartRecord } from '../catalogue/part.repository'
import { AppError } from '../errors/app-error'
import type { PartService } from '../catalogue/part.service'

const ARTICLE = (word: string) => (/^[aeiou]/i.test(word) ? 'an' : 'a')

/**
 * Checks a build's slots and finds their parts. Every problem is collected so
 * the answer names all unknown slots, unknown parts and misplaced kinds at once.
 */
export async function resolveSlots(parts: PartService, slots: Record<string, string | string[]>): Promise<Map<SlotId, PartRecord>> {
  const problems: FieldError[] = []
  const resolved = new Map<SlotId, PartRecord>()
  for (const [slot, value] of Object.entries(slots)) {
    const path = `slots.${slot}`
    if (!isSlotId(slot)) {
      problems.push({ path, message: `Unknown slot "${slot}". Slots are: ${BUILD_SLOTS.map((s) => s.id).join(', ')}.` })
      continue
    }
    const numbers = (Array.isArray(value) ? value : [value]).map((v) => v.trim()).filter(Boolean)
    if (numbers.length > 1) {
      problems.push({ path, message: `Two parts in one slot: ${slot} holds one part, got ${numbers.join(', ')}.` })
      continue
    }
    if (numbers.length === 0) continue
    const number = numbers[0]!
    const entity = await parts.findEntity(number)
    if (!entity) {
      problems.push({ path, message: `Unknown part number "${number}".` })
      continue
    }
    if (entity.kind !== slot) {
      const kindLabel = PART_KIND_LABELS[entity.kind].toLowerCase()
      const slotLabel = PART_KIND_LABELS[slot].toLowerCase()
      problems.push({
        path,
        message: `${entity.partNumber} is ${ARTICLE(kindLabel)} ${kindLabel}, not ${ARTICLE(slotLabel)} ${slotLabel}.`,
      })
      continue
    }
    resolved.set(slot, entity)
  }
  if (problems.length) {
    throw AppError.badRequest(problems.map((p) => p.message).join(' '), problems)
  }
  return resolved
}
