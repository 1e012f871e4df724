import { z } from 'zod'
import { partSchema } from './part'

const attributeValue = z.union([z.string(), z.number(), z.boolean()]).nullable()

export const substitutesQuerySchema = z.object({
  page: z.coerce.number().int().min(1).max(1000).default(1),
  pageSize: z.coerce.number().int().min(1).max(50).default(10),
})
export type SubstitutesQuery = z.infer<typeof substitutesQuerySchema>

export const substituteSchema = z.object({
  part: partSchema,
  /** How many of the part's mating parts this one also fits. */
  sharedCount: z.number().int(),
  /** Some of those mating parts, by number. */
  shared: z.array(z.string()),
  /** Attributes whose values differ (null where one of the two has none). */
  differences: z.array(z.object({ name: z.string(), this: attributeValue, other: attributeValue })),
})
export type Substitute = z.infer<typeof substituteSchema>

export const substitutesResponseSchema = z.object({
  part: partSchema,
  total: z.number().int(),
  page: z.number().int(),
  pageSize: z.number().int(),
  /** True when a hub part had more mating parts or links than are weighed; the answer is then from the first ones. */
  capped: z.boolean(),
  items: z.array(substituteSchema),
})
export type SubstitutesResponse = z.infer<typeof substitutesResponseSchema>
