import { z } from 'zod'
import { markTypeSchema, partMarkSchema, partSchema } from './part'

/** How far a near match may be from what was typed: a character or two. */
export const NEAR_MATCH_MAX_DISTANCE = 2

export const partLookupQuerySchema = z.object({
  q: z.string().trim().min(1, 'Type a part number or mark.').max(100),
})
export type PartLookupQuery = z.infer<typeof partLookupQuerySchema>

/** Which mark a part was found by when the text was not its own number. */
export const resolvedFromSchema = z.object({ type: markTypeSchema, value: z.string() })
export type ResolvedFrom = z.infer<typeof resolvedFromSchema>

export const partLookupSchema = z.object({
  q: z.string(),
  /** The part the text names exactly (its number or one of its marks), if any. */
  part: partSchema.nullable(),
  resolvedFrom: resolvedFromSchema.nullable(),
  /** Numbers that differ from the text by a character or two, nearest first. */
  near: z.array(z.object({ part: partSchema, distance: z.number().int() })),
  /** Marks that contain the text, with the part that carries them. */
  marks: z.array(z.object({ part: partSchema, mark: partMarkSchema })),
})
export type PartLookup = z.infer<typeof partLookupSchema>
