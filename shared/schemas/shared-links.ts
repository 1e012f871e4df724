import { z } from 'zod'
import { buildSheetSchema, evaluationSchema } from './build'
import { quoteSchema } from './quotes'

export const SHARE_DAYS = { min: 1, max: 30, default: 7 } as const

export const shareRequestSchema = z.strictObject({
  email: z.string().trim().toLowerCase().pipe(z.email('Enter a valid e-mail address.')),
  days: z
    .number()
    .int('Give whole days.')
    .min(SHARE_DAYS.min, `A link works for ${SHARE_DAYS.min} to ${SHARE_DAYS.max} days.`)
    .max(SHARE_DAYS.max, `A link works for ${SHARE_DAYS.min} to ${SHARE_DAYS.max} days.`)
    .default(SHARE_DAYS.default),
})
export type ShareRequest = z.input<typeof shareRequestSchema>

export const shareAnswerSchema = z.object({
  id: z.number().int(),
  kind: z.enum(['sheet', 'quote']),
  recipient: z.string(),
  expiresAt: z.string(),
})
export type ShareAnswer = z.infer<typeof shareAnswerSchema>

export const sharedOpenSchema = z.strictObject({ token: z.string().trim().min(1, 'The link is not complete.').max(200) })

/** A shared build sheet as its reader sees it: no owner id, nothing to edit. */
export const sharedSheetSchema = buildSheetSchema.pick({
  name: true,
  slots: true,
  targetPowerKw: true,
  fuelOctane: true,
  chassisModelYear: true,
  vin: true,
  faceFinish: true,
  notes: true,
  updatedAt: true,
})

export const sharedViewSchema = z.discriminatedUnion('kind', [
  z.object({
    kind: z.literal('sheet'),
    sharedBy: z.string(),
    expiresAt: z.string(),
    sheet: sharedSheetSchema,
    /** Null when the build can no longer be judged (a part left the catalogue). */
    evaluation: evaluationSchema.nullable(),
  }),
  z.object({ kind: z.literal('quote'), sharedBy: z.string(), expiresAt: z.string(), quote: quoteSchema }),
])
export type SharedView = z.infer<typeof sharedViewSchema>
