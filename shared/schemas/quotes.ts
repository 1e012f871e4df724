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

/** The customer's vehicle as quoted; make, model and engine family only when a vehicle application names them (older quotes have none). */
export const quoteVehicleSchema = z.object({
  modelYear: z.number().nullable(),
  vin: z.string().nullable(),
  make: z.string().nullable().default(null),
  model: z.string().nullable().default(null),
  engineFamily: z.string().nullable().default(null),
})
export type QuoteVehicle = z.infer<typeof quoteVehicleSchema>

export const quoteSchema = z.object({
  id: z.number().int(),
  status: z.enum(['draft', 'accepted']),
  customer: z.string(),
  buildSheetId: z.number().int().nullable(),
  /** The build sheet's name when the quote was made from one (older quotes have none). */
  buildName: z.string().nullable().default(null),
  shop: shopSettingsSchema,
  vehicle: quoteVehicleSchema,
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
  vehicle: quoteVehicleSchema,
  totalCents: z.number().int(),
  currency: z.string(),
  createdBy: z.string(),
  createdAt: z.string(),
  reservedUntil: z.string().nullable(),
})
export type QuoteSummary = z.infer<typeof quoteSummarySchema>

/** GET /api/quotes: a search over customer, job number, VIN, make, model and engine family, one page at a time. */
export const quoteListQuerySchema = z.object({
  q: z.string().trim().max(100, 'Keep the search under 100 characters.').default(''),
  page: z.coerce.number({ error: 'Page is a number.' }).int('Page is a whole number.').min(1, 'Pages start at 1.').max(100_000).default(1),
  pageSize: z.coerce
    .number({ error: 'Page size is a number.' })
    .int()
    .min(1, 'Show at least one quote a page.')
    .max(100, 'Show at most 100 quotes a page.')
    .default(25),
})
export type QuoteListQuery = z.infer<typeof quoteListQuerySchema>
export const quoteListSchema = z.object({
  items: z.array(quoteSummarySchema),
  total: z.number().int(),
  page: z.number().int(),
  pageSize: z.number().int(),
})
export type QuoteList = z.infer<typeof quoteListSchema>
