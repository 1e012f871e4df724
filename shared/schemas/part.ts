import { z } from 'zod'
import { partKindSchema } from './part-kinds'

const year = z.number().int().min(1900).max(2100)

export const MARK_TYPES = ['casting', 'stamped', 'superseded'] as const
export const markTypeSchema = z.enum(MARK_TYPES)
export type MarkType = z.infer<typeof markTypeSchema>

export const partMarkSchema = z.object({ type: markTypeSchema, value: z.string() })
export type PartMark = z.infer<typeof partMarkSchema>

export const partSchema = z.object({
  partNumber: z.string(),
  kind: partKindSchema,
  name: z.string(),
  family: z.string(),
  yearFrom: year.nullable(),
  yearTo: year.nullable(),
  notes: z.string(),
  attributes: z.record(z.string(), z.union([z.string(), z.number(), z.boolean()])),
  marks: z.array(partMarkSchema),
  /** The price to quote when no unit is on a shelf, in cents of the shop's currency. */
  listPriceCents: z.number().int().nullable().optional(),
})
export type Part = z.infer<typeof partSchema>

export const partNumberParamsSchema = z.object({ partNumber: z.string().trim().min(1, 'Give a part number.').max(100) })

export const partListQuerySchema = z.object({
  q: z.string().trim().max(100).optional().default(''),
  kind: partKindSchema.optional(),
  page: z.coerce.number().int().min(1).max(100000).default(1),
  pageSize: z.coerce.number().int().min(1).max(200).default(25),
})
export type PartListQuery = z.infer<typeof partListQuerySchema>

export const partListSchema = z.object({
  items: z.array(partSchema),
  total: z.number().int(),
})
export type PartList = z.infer<typeof partListSchema>

/** Part numbers and marks compare without case, spaces, dashes, dots or slashes. */
export function normalisePartCode(value: string): string {
  return value.toUpperCase().replace(/[^A-Z0-9]/g, '')
}
