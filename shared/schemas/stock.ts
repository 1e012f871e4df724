import { z } from 'zod'
import { validateVin } from '../engineering/vin'

export const STOCK_CONDITIONS = ['new', 'remanufactured', 'used', 'core'] as const
export const stockConditionSchema = z.enum(STOCK_CONDITIONS, { error: () => `Condition is one of ${STOCK_CONDITIONS.join(', ')}.` })
export type StockCondition = z.infer<typeof stockConditionSchema>

export const USED_GRADES = ['A', 'B', 'C'] as const
export const STOCK_STATUSES = ['available', 'reserved', 'sold'] as const
export const stockStatusSchema = z.enum(STOCK_STATUSES, { error: () => `Status is one of ${STOCK_STATUSES.join(', ')}.` })
export type StockStatus = z.infer<typeof stockStatusSchema>

const cents = (what: string) =>
  z
    .number({ error: `${what} is a number of cents.` })
    .int(`${what} is a whole number of cents.`)
    .min(0, `${what} cannot be negative.`)
    .max(100_000_000, `${what} is more than a million.`)

export const siteInputSchema = z.strictObject({
  name: z.string().trim().min(1, 'Name the site.').max(100, 'Keep the site name under 100 characters.'),
  address: z.string().trim().max(300, 'Keep the address under 300 characters.').default(''),
})
export type SiteInput = z.infer<typeof siteInputSchema>
export const siteSchema = z.object({ id: z.number().int(), name: z.string(), address: z.string() })
export type Site = z.infer<typeof siteSchema>

/** For used parts: A (like new) to C (worn but serviceable). */
const gradeSchema = z.enum(USED_GRADES, { error: () => 'Grade is A, B or C.' }).nullable()
/** Where on the site: shelf, bin, rack. */
const locationSchema = z.string().trim().max(100)
const damageNotesSchema = z.string().trim().max(2000)

const stockFields = {
  condition: stockConditionSchema,
  grade: gradeSchema.default(null),
  mileageKm: z.number().int().min(0, 'Mileage cannot be negative.').max(5_000_000).nullable().default(null),
  donorVin: z.string().trim().toUpperCase().max(17, 'A VIN has 17 characters.').nullable().default(null),
  donorYear: z.number().int().min(1950).max(2100).nullable().default(null),
  damageNotes: damageNotesSchema.default(''),
  location: locationSchema.default(''),
  priceCents: cents('Price'),
  coreChargeCents: cents('Core charge').default(0),
  status: stockStatusSchema.default('available'),
  /** The code on the unit's label, scanned at the counter. */
  label: z.string().trim().min(1).max(60).nullable().default(null),
}

export const stockInputSchema = z
  .strictObject({
    partNumber: z.string().trim().min(1, 'Give a part number.').max(100),
    site: z.string().trim().min(1, 'Name the site.').max(100),
    ...stockFields,
  })
  .superRefine((item, ctx) => {
    if (item.grade && item.condition !== 'used')
      ctx.addIssue({ code: 'custom', path: ['grade'], message: 'Only used parts carry a grade.' })
    // The donor's VIN is how a used part is traced back to its car, so it must be one that could be read off a car.
    const vin = item.donorVin ? validateVin(item.donorVin) : null
    if (vin && !vin.valid) ctx.addIssue({ code: 'custom', path: ['donorVin'], message: `${vin.problems[0] ?? 'Not a VIN'}.` })
  })
export type StockInput = z.infer<typeof stockInputSchema>

// No defaults here: a field left out of a change keeps the unit's value.
export const stockUpdateSchema = z
  .strictObject({
    site: z.string().trim().min(1).max(100).optional(),
    location: locationSchema.optional(),
    priceCents: cents('Price').optional(),
    coreChargeCents: cents('Core charge').optional(),
    status: stockStatusSchema.optional(),
    damageNotes: damageNotesSchema.optional(),
    grade: gradeSchema.optional(),
  })
  .refine((value) => Object.keys(value).length > 0, 'Change at least one field.')
export type StockUpdate = z.infer<typeof stockUpdateSchema>

export const stockItemSchema = z.object({
  id: z.number().int(),
  partNumber: z.string(),
  site: siteSchema,
  condition: stockConditionSchema,
  grade: z.enum(USED_GRADES).nullable(),
  mileageKm: z.number().nullable(),
  donorVin: z.string().nullable(),
  donorYear: z.number().nullable(),
  damageNotes: z.string(),
  location: z.string(),
  priceCents: z.number().int(),
  coreChargeCents: z.number().int(),
  status: stockStatusSchema,
  label: z.string().nullable(),
  updatedAt: z.string(),
})
export type StockItem = z.infer<typeof stockItemSchema>

/** A photo of a unit (its display size; `?size=thumb` gives the thumbnail). */
export const stockPhotoSchema = z.object({ id: z.number().int(), width: z.number().int(), height: z.number().int() })
export type StockPhoto = z.infer<typeof stockPhotoSchema>
export const stockPhotoListSchema = z.array(stockPhotoSchema)

export const stockListQuerySchema = z.object({
  part: z.string().trim().max(100).optional(),
  site: z.string().trim().max(100).optional(),
  status: stockStatusSchema.optional(),
  page: z.coerce.number().int().min(1).max(100_000).default(1),
  pageSize: z.coerce.number().int().min(1).max(200).default(50),
})
export const stockListSchema = z.object({ items: z.array(stockItemSchema), total: z.number().int() })
export type StockList = z.infer<typeof stockListSchema>

/** What a what-fits line or a slot suggestion says about the shelf: available units of the part. */
export const availabilitySchema = z.object({
  available: z.number().int(),
  bestCondition: stockConditionSchema.nullable(),
  minPriceCents: z.number().int().nullable(),
  maxPriceCents: z.number().int().nullable(),
  /** The nearest site first (see nearestSite), then the others by name. */
  sites: z.array(z.string()),
  /** The asker's home site when it has a unit, else the site with the most units (ties by name); null when none has one. */
  nearestSite: z.string().nullable(),
})
export type Availability = z.infer<typeof availabilitySchema>
export const NO_STOCK: Availability = {
  available: 0,
  bestCondition: null,
  minPriceCents: null,
  maxPriceCents: null,
  sites: [],
  nearestSite: null,
}
