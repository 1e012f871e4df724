import { z } from 'zod'
import { evaluateRequestSchema, cautionSchema } from './build'
import { stockConditionSchema } from './stock'

export const shopSettingsSchema = z.strictObject({
  name: z.string().trim().min(1, 'Name the shop.').max(100),
  address: z.string().trim().max(300).default(''),
  /** Labour per hour, in cents. */
  labourRateCents: z.number().int().min(0, 'The labour rate cannot be negative.').max(10_000_000),
  /** Tax in basis points: 20 % is 2000. */
  taxRateBasisPoints: z.number().int().min(0).max(10_000, 'Tax is at most 100 %.'),
  currency: z.string().regex(/^[A-Z]{3}$/, 'Use a three-letter currency code, like EUR.'),
  /** Base job time per slot group of the template, in minutes, before any modification. */
  baseMinutesPerGroup: z
    .number()
    .int()
    .min(0)
    .max(24 * 60)
    .default(45),
  /** How long accepting a quote holds its units, in hours. */
  reservationHours: z
    .number()
    .int()
    .min(1)
    .max(24 * 30)
    .default(72),
})
export type ShopSettings = z.infer<typeof shopSettingsSchema>

export const quoteRequestSchema = z.union([
  z.strictObject({ buildSheetId: z.number().int().positive(), customer: z.string().trim().max(200).default('') }),
  evaluateRequestSchema.extend({ customer: z.string().trim().max(200).default('') }),
])
export type QuoteRequest = z.infer<typeof quoteRequestSchema>

export const quoteLineSchema = z.object({
  kind: z.enum(['part', 'consumable', 'labour', 'core']),
  partNumber: z.string().optional(),
  description: z.string(),
  quantity: z.number(),
  minutes: z.number().int().optional(),
  unitPriceCents: z.number().int(),
  /** No unit on a shelf and no price: to order, price on request. */
  toOrder: z.boolean().default(false),
  stockItemId: z.number().int().optional(),
  condition: stockConditionSchema.optional(),
  site: z.string().optional(),
  location: z.string().optional(),
})
export type QuoteLine = z.infer<typeof quoteLineSchema>

export const quoteSchema = z.object({
  id: z.number().int(),
  status: z.enum(['draft', 'accepted']),
  customer: z.string(),
  buildSheetId: z.number().int().nullable(),
  /** The build sheet's name when the quote was made from one (older quotes have none). */
  buildName: z.string().nullable().default(null),
  shop: shopSettingsSchema,
  vehicle: z.object({ modelYear: z.number().nullable(), vin: z.string().nullable() }),
  lines: z.array(quoteLineSchema),
  totals: z.object({
    partsCents: z.number(),
    labourCents: z.number(),
    coreCents: z.number(),
    taxCents: z.number(),
    totalCents: z.number(),
  }),
  cautions: z.array(cautionSchema),
  createdBy: z.string(),
  createdAt: z.string(),
  reservedUntil: z.string().nullable(),
})
export type Quote = z.infer<typeof quoteSchema>

/** One line of the quotes list: who it is for and what it comes to, without its lines. */
export const quoteSummarySchema = z.object({
  id: z.number().int(),
  status: z.enum(['draft', 'accepted']),
  customer: z.string(),
  buildName: z.string().nullable(),
  totalCents: z.number().int(),
  currency: z.string(),
  createdBy: z.string(),
  createdAt: z.string(),
  reservedUntil: z.string().nullable(),
})
export type QuoteSummary = z.infer<typeof quoteSummarySchema>
