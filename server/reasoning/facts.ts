import type { SlotId } from '../../shared/build-template'
import type { BuildContext } from '../../shared/schemas/build'
import type { FigureFacts, FigurePart } from './figures'
import type { Facts } from './rule-book'

/** The facts rules read: each slot's attributes under its kind, the figures, the input and the filled slots. */
export function buildFacts(
  parts: Partial<Record<SlotId, FigurePart & { partNumber?: string }>>,
  figures: FigureFacts,
  context: BuildContext,
  slotNumbers: Partial<Record<SlotId, string>> = {},
): Facts {
  const facts: Facts = { figures, input: context, slots: slotNumbers }
  for (const [slot, part] of Object.entries(parts)) if (part) facts[slot] = part.attributes
  return facts
}
