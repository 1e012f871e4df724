import { z } from 'zod'
import { linkSourceSchema, relationSchema, reviewStatusSchema } from './fitment'

const partNumber = z.string().trim().min(1, 'Give a part number.').max(100)
const modificationName = z
  .string()
  .trim()
  .regex(/^[a-z0-9-]+$/, 'Modification names are kebab-case, like hardened-washer-stack.')

export const linkSchema = z.object({
  id: z.number().int(),
  from: z.string(),
  to: z.string(),
  relation: relationSchema,
  modifications: z.array(z.string()),
  note: z.string(),
  source: linkSourceSchema,
  status: reviewStatusSchema,
  createdAt: z.string(),
  updatedAt: z.string(),
  /** Approved field reports that found this pair otherwise: the link is worth a second look. */
  contradictedBy: z.number().int().default(0),
})
export type Link = z.infer<typeof linkSchema>

export const linkListQuerySchema = z.object({
  status: reviewStatusSchema.optional(),
  part: z.string().trim().max(100).optional(),
  /** Only links an approved field report found otherwise. */
  contradicted: z
    .enum(['0', '1'], { error: () => 'Contradicted must be 0 or 1.' })
    .optional()
    .transform((value) => value === '1'),
  page: z.coerce.number().int().min(1).default(1),
  pageSize: z.coerce.number().int().min(1).max(200).default(50),
})
export const linkListSchema = z.object({ items: z.array(linkSchema), total: z.number().int() })
export type LinkList = z.infer<typeof linkListSchema>

function modificationsMatchRelation(value: { relation?: string; modifications?: string[] }, ctx: z.RefinementCtx) {
  if (value.relation === 'fits-with-modification' && value.modifications?.length === 0) {
    ctx.addIssue({ code: 'custom', path: ['modifications'], message: 'Name the modification a fit with modification needs.' })
  }
  if (value.relation && value.relation !== 'fits-with-modification' && value.modifications?.length) {
    ctx.addIssue({ code: 'custom', path: ['modifications'], message: 'Only a fit with modification names modifications.' })
  }
}

export const linkCreateSchema = z
  .object({
    fromPart: partNumber,
    toPart: partNumber,
    relation: relationSchema,
    modifications: z.array(modificationName).max(10).default([]),
    note: z.string().max(2000).default(''),
  })
  .superRefine(modificationsMatchRelation)
export type LinkCreate = z.infer<typeof linkCreateSchema>

export const linkUpdateSchema = z
  .object({
    relation: relationSchema,
    modifications: z.array(modificationName).max(10),
    note: z.string().max(2000),
    status: reviewStatusSchema,
  })
  .partial()
  .refine((value) => Object.keys(value).length > 0, 'Change at least one of relation, modifications, note or status.')
  .superRefine(modificationsMatchRelation)
export type LinkUpdate = z.infer<typeof linkUpdateSchema>

export const identityCreateSchema = z.object({ partA: partNumber, partB: partNumber, note: z.string().max(2000).default('') })
export type IdentityCreate = z.infer<typeof identityCreateSchema>
export const identitySchema = z.object({
  id: z.number().int(),
  partA: z.string(),
  partB: z.string(),
  note: z.string(),
  source: linkSourceSchema,
})
export type Identity = z.infer<typeof identitySchema>
