import { BUILD_SLOTS, type SlotId } from '../../shared/build-template'
import type { AppliedModification, PartsListLine } from '../../shared/schemas/build'
import type { Part } from '../../shared/schemas/part'
import type { ConsumableSpec, RuleExtraPart } from './rule-file.schema'

/** Finds a catalogue part for a rule's "findPart", e.g. a donor housing with a given flange. */
export type PartFinder = (spec: NonNullable<RuleExtraPart['findPart']>) => Promise<string[]>

function quantityOf(value: number | string, cylinders: number): number {
  const number = typeof value === 'number' ? value : Number(value)
  return Number.isFinite(number) && number > 0 ? number : cylinders
}

function chosenReason(slot: SlotId, part: Part): string {
  const label = BUILD_SLOTS.find((s) => s.id === slot)!.label.toLowerCase()
  if (slot === 'head-bolt' && part.attributes.torqueToYield === true) return `Chosen ${label}; torque-to-yield, single-use: always new.`
  if (slot === 'head-gasket' || slot === 'intake-gasket' || slot === 'exhaust-gasket') return `Chosen ${label}; single-use: always new.`
  return `Chosen ${label}.`
}

/**
 * The whole bill for a build: the chosen parts, the parts its modifications
 * call for and the consumables a job like this needs.
 */
export async function buildPartsList(input: {
  parts: Partial<Record<SlotId, Part>>
  cylinders: number
  modifications: (AppliedModification & { ruleExtraParts: RuleExtraPart[] })[]
  extraParts: (RuleExtraPart & { reason: string })[]
  consumables: ConsumableSpec[]
  findParts: PartFinder
}): Promise<PartsListLine[]> {
  const lines: PartsListLine[] = []
  const seen = new Set<string>()
  const add = (line: PartsListLine) => {
    const key = `${line.partNumber ?? ''}|${line.description}`
    if (seen.has(key)) return
    seen.add(key)
    lines.push(line)
  }
  const chosenNumbers = new Set(Object.values(input.parts).map((part) => part!.partNumber))

  for (const slot of BUILD_SLOTS) {
    const part = input.parts[slot.id]
    if (!part) continue
    add({
      partNumber: part.partNumber,
      description: part.name,
      quantity: slot.quantity === 'per-cylinder' ? input.cylinders : 1,
      unit: slot.unit,
      reason: chosenReason(slot.id, part),
      category: 'chosen',
    })
  }

  const addRuleExtra = async (extra: RuleExtraPart, reason: string) => {
    let partNumber = extra.partNumber
    let description = extra.description
    if (!partNumber && extra.findPart) {
      const matches = (await input.findParts(extra.findPart)).filter((number) => !chosenNumbers.has(number))
      partNumber = matches[0]
      if (matches.length > 1) description = `${description}; alternatives: ${matches.slice(1, 4).join(', ')}`
    }
    add({ partNumber, description, quantity: quantityOf(extra.quantity, input.cylinders), unit: 'piece', reason, category: 'modification' })
  }

  for (const modification of input.modifications) {
    for (const extra of modification.ruleExtraParts) await addRuleExtra(extra, `For: ${modification.title}.`)
    for (const extra of modification.extraParts) {
      add({ ...extra, unit: 'piece', reason: `For: ${modification.title}.`, category: 'modification' })
    }
    for (const consumable of modification.consumables) {
      add({ description: consumable, quantity: 1, unit: 'as needed', reason: `For: ${modification.title}.`, category: 'consumable' })
    }
  }
  for (const extra of input.extraParts) await addRuleExtra(extra, extra.reason)

  for (const consumable of input.consumables) {
    if (!input.parts[consumable.whenSlot]) continue
    if (consumable.unlessSlot && input.parts[consumable.unlessSlot]) continue
    add({
      description: consumable.description,
      quantity: consumable.quantity === 'per-cylinder' ? input.cylinders : consumable.quantity,
      unit: consumable.unit,
      reason: consumable.reason,
      category: 'consumable',
    })
  }
  return lines
}
