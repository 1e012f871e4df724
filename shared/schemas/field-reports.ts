import { z } from 'zod'
import { relationSchema } from './fitment'

const partNumber = z.string().trim().min(1, 'Give a part number.').max(100, 'A part number has at most 100 characters.')
const modificationName = z
  .string()
  .trim()
  .regex(/^[a-z0-9-]{1,80}$/, 'Modification names are lower-case words joined by hyphens, like hardened-washer-stack.')

/** One mating pair as the tech found it on the car. */
export const reportedPairSchema = z
  .object({
    from: partNumber,
    to: partNumber,
    relation: relationSchema,
    modifications: z.array(modificationName).max(10, 'Name at most 10 modifications per pair.').default([]),
    note: z.string().trim().max(2000, 'Keep a pair note under 2,000 characters.').default(''),
  })
  .superRefine((pair, ctx) => {
    if (pair.relation === 'fits-with-modification' && pair.modifications.length === 0) {
      ctx.addIssue({ code: 'custom', path: ['modifications'], message: 'Name the modification the fit needed.' })
    }
    if (pair.relation !== 'fits-with-modification' && pair.modifications.length > 0) {
      ctx.addIssue({ code: 'custom', path: ['modifications'], message: 'Only a fit with modification names modifications.' })
    }
  })
export type ReportedPair = z.infer<typeof reportedPairSchema>

export const measurementSchema = z.object({
  name: z.string().trim().min(1, 'Name the measurement.').max(100),
  value: z.number({ error: 'A measurement value is a number.' }).finite(),
  unit: z.string().trim().min(1, 'Give the unit, such as mm.').max(20),
})
export type Measurement = z.infer<typeof measurementSchema>

export const reportedVehicleSchema = z.object({
  modelYear: z
    .number({ error: 'Model year is a number.' })
    .int('Model year is a whole number.')
    .min(1950, 'Model year must be 1950 or later.')
    .max(2100, 'Model year must be 2100 or earlier.')
    .optional(),
  vin: z.string().trim().toUpperCase().max(17, 'A VIN has 17 characters.').optional(),
  mileageKm: z
    .number({ error: 'Mileage is a number.' })
    .int('Mileage is a whole number of km.')
    .min(0, 'Mileage cannot be negative.')
    .max(5_000_000)
    .optional(),
})

/** The `report` field of `POST /api/field-reports`: parts named by number, mark or superseded number. */
export const fieldReportInputSchema = z.strictObject({
  pairs: z.array(reportedPairSchema).min(1, 'Report at least one pair of parts.').max(30, 'Report at most 30 pairs at once.'),
  vehicle: reportedVehicleSchema.optional(),
  measurements: z.array(measurementSchema).max(40, 'Give at most 40 measurements.').default([]),
  notes: z.string().trim().max(10_000, 'Keep the notes under 10,000 characters.').default(''),
})
export type FieldReportInput = z.infer<typeof fieldReportInputSchema>

export const FIELD_REPORT_STATUSES = ['submitted', 'approved', 'rejected', 'needs-more'] as const
export const fieldReportStatusSchema = z.enum(FIELD_REPORT_STATUSES, {
  error: () => `Status is one of ${FIELD_REPORT_STATUSES.join(', ')}.`,
})
export type FieldReportStatus = z.infer<typeof fieldReportStatusSchema>

export const fieldReportPhotoSchema = z.object({ id: z.number().int(), width: z.number().int(), height: z.number().int() })

export const fieldReportSchema = z.object({
  id: z.number().int(),
  status: fieldReportStatusSchema,
  reporter: z.object({ id: z.number().int().nullable(), name: z.string() }),
  createdAt: z.string(),
  /** Pairs with the catalogue's own part numbers (a mark or old number typed resolves to the current part). */
  pairs: z.array(reportedPairSchema),
  vehicle: reportedVehicleSchema.nullable(),
  measurements: z.array(measurementSchema),
  notes: z.string(),
  photos: z.array(fieldReportPhotoSchema),
  /** Things worth a second look that did not stop the report (a VIN whose check digit is wrong). */
  warnings: z.array(z.string()),
  decision: z.object({ by: z.string(), at: z.string(), note: z.string() }).nullable(),
})
export type FieldReport = z.infer<typeof fieldReportSchema>

export const fieldReportListQuerySchema = z.object({
  status: fieldReportStatusSchema.optional(),
  /** Reports counted on the link between these two parts (both or neither). */
  from: z.string().trim().min(1).max(100).optional(),
  to: z.string().trim().min(1).max(100).optional(),
  page: z.coerce.number().int().min(1).max(100_000).default(1),
  pageSize: z.coerce.number().int().min(1).max(100).default(25),
})
export const fieldReportListSchema = z.object({ items: z.array(fieldReportSchema), total: z.number().int() })
export type FieldReportList = z.infer<typeof fieldReportListSchema>

export const PHOTO_TYPES = ['image/jpeg', 'image/png', 'image/webp'] as const
export const FIELD_REPORT_MAX_PHOTOS = 8
