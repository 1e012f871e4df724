import { z } from 'zod'
import { partMarkSchema } from './part'
import { partAttributeSchemas } from './part-attributes'
import { partKindSchema } from './part-kinds'

const year = z.number().int().min(1900, 'Year must be 1900 or later.').max(2100, 'Year must be 2100 or earlier.')

/** A part as an editor or an import writes it; attributes checked against the kind's schema. */
export const partInputSchema = z
  .object({
    partNumber: z
      .string()
      .trim()
      .min(1, 'Part number is required.')
      .max(60, 'Part number is at most 60 characters.')
      .regex(/[A-Za-z0-9]/, 'Part number needs at least one letter or digit.'),
    kind: partKindSchema,
    name: z.string().trim().min(1, 'Name is required.').max(200),
    family: z.string().trim().max(80).default(''),
    yearFrom: year.nullable().default(null),
    yearTo: year.nullable().default(null),
    notes: z.string().max(4000).default(''),
    attributes: z.record(z.string(), z.union([z.string(), z.number(), z.boolean()])).default({}),
    marks: z.array(partMarkSchema).default([]),
    /** In cents; the parts file writes it as a decimal (`list_price`). */
    listPriceCents: z
      .number()
      .int('The list price is in whole cents.')
      .min(0, 'The list price cannot be negative.')
      .max(100_000_000, 'The list price is at most 1,000,000.')
      .nullable()
      .default(null),
  })
  .superRefine((part, ctx) => {
    if (part.yearFrom !== null && part.yearTo !== null && part.yearFrom > part.yearTo) {
      ctx.addIssue({ code: 'custom', path: ['yearFrom'], message: 'year_from is after year_to.' })
    }
    const attributes = partAttributeSchemas[part.kind].safeParse(part.attributes)
    if (!attributes.success) {
      for (const issue of attributes.error.issues) {
        ctx.addIssue({ code: 'custom', path: ['attributes', ...issue.path.map(String)], message: issue.message })
      }
    }
  })
export type PartInput = z.output<typeof partInputSchema>
