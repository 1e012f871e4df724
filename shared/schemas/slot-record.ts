import { z } from 'zod'
import { BUILD_SLOTS } from '../build-template'

const SLOT_IDS: ReadonlySet<string> = new Set(BUILD_SLOTS.map((slot) => slot.id))
const NAMED = 3

const shown = (key: string) => JSON.stringify(key.length > 40 ? `${key.slice(0, 40)}…` : key)

/**
 * A record keyed by build slot. Unknown keys are refused in one short message
 * before any value is read, so a request with thousands of keys costs one line
 * of answer, not one error per key.
 */
export function slotRecord<T extends z.ZodType>(value: T) {
  return z
    .record(z.string(), z.unknown())
    .superRefine((record, ctx) => {
      const unknown = Object.keys(record).filter((key) => !SLOT_IDS.has(key))
      if (unknown.length === 0) return
      const more = unknown.length > NAMED ? ` and ${unknown.length - NAMED} more` : ''
      ctx.addIssue({
        code: 'custom',
        path: [unknown[0]!],
        message: `Unknown slot ${unknown.slice(0, NAMED).map(shown).join(', ')}${more}. Slots are: ${[...SLOT_IDS].join(', ')}.`,
      })
    })
    .pipe(z.record(z.string(), value))
}
