import { availabilitySchema, NO_STOCK } from './stock'
import { z } from 'zod'
import { resolvedFromSchema } from './part-lookup'
import { partSchema } from './part'
import { partKindSchema } from './part-kinds'

export const RELATIONS = ['fits', 'fits-with-modification', 'does-not-fit'] as const
export const relationSchema = z.enum(RELATIONS, {
  error: () => `Relation must be one of: ${RELATIONS.join(', ')}.`,
})
export type Relation = z.infer<typeof relationSchema>

/** A judged pair may also have no evidence either way. */
export const VERDICTS = ['fits', 'fits-with-modification', 'does-not-fit', 'unknown'] as const
export const verdictSchema = z.enum(VERDICTS)
export type Verdict = z.infer<typeof verdictSchema>

/** Worst first: the verdict of a build is the worst of its pairs. */
const SEVERITY: Record<Verdict, number> = { 'does-not-fit': 3, unknown: 2, 'fits-with-modification': 1, fits: 0 }
export function worstVerdict(verdicts: Iterable<Verdict>, empty: Verdict = 'fits'): Verdict {
  let worst: Verdict | null = null
  for (const verdict of verdicts) if (worst === null || SEVERITY[verdict] > SEVERITY[worst]) worst = verdict
  return worst ?? empty
}
export function verdictRank(verdict: Verdict): number {
  return SEVERITY[verdict]
}

export const REVIEW_STATUSES = ['approved', 'proposed', 'rejected'] as const
export const reviewStatusSchema = z.enum(REVIEW_STATUSES)
export type ReviewStatus = z.infer<typeof reviewStatusSchema>

export const LINK_SOURCES = ['demo', 'import', 'field-report', 'editor'] as const
export const linkSourceSchema = z.enum(LINK_SOURCES)
export type LinkSource = z.infer<typeof linkSourceSchema>

export const SKILL_LEVELS = ['basic', 'skilled', 'specialist'] as const
export const skillLevelSchema = z.enum(SKILL_LEVELS)
export type SkillLevel = z.infer<typeof skillLevelSchema>

export const extraPartSchema = z.object({
  description: z.string(),
  quantity: z.number().positive(),
  partNumber: z.string().optional(),
})
export type ExtraPart = z.infer<typeof extraPartSchema>

/** A modification's caution: its text, or its text and the service manual section that governs it. */
export const modificationCautionSchema = z.union([z.string(), z.object({ text: z.string(), manual: z.string() }).strict()])
export type ModificationCaution = z.infer<typeof modificationCautionSchema>

export const modificationSchema = z.object({
  name: z.string(),
  title: z.string(),
  summary: z.string(),
  steps: z.array(z.string()),
  extraParts: z.array(extraPartSchema),
  consumables: z.array(z.string()),
  skillLevel: skillLevelSchema,
  timeMinutes: z.number().int().nullable(),
  cautions: z.array(modificationCautionSchema),
  status: z.enum(['approved', 'proposed']),
})
export type Modification = z.infer<typeof modificationSchema>

/** One step of the reasoning behind an answer. */
export const explanationStepSchema = z.object({
  type: z.enum(['link', 'identity', 'rule', 'note']),
  text: z.string(),
  from: z.string().optional(),
  to: z.string().optional(),
  relation: relationSchema.optional(),
  review: reviewStatusSchema.optional(),
  source: z.string().optional(),
  linkId: z.number().int().optional(),
  ruleId: z.string().optional(),
  /** For a caution: the service manual section that governs. */
  manual: z.string().optional(),
})
export type ExplanationStep = z.infer<typeof explanationStepSchema>

export const fitResultSchema = z.object({
  part: partSchema,
  relation: relationSchema,
  decidedBy: z.enum(['link', 'rule']),
  /** approved or proposed for reviewed links; inferred for a rule's answer. */
  review: z.enum(['approved', 'proposed', 'inferred']),
  ruleIds: z.array(z.string()),
  modifications: z.array(modificationSchema),
  explanation: z.array(explanationStepSchema),
  /** Approved field reports that found the same on a car, or found otherwise (the link is then worth a second look). */
  fieldReports: z.object({ confirmed: z.number().int(), contradicted: z.number().int() }).default({ confirmed: 0, contradicted: 0 }),
  /** The two parts of the reviewed link that decided, which may be identical to the parts asked about; the field reports are on it. */
  linkParts: z.tuple([z.string(), z.string()]).optional(),
  /** What is on the shelf of this part. */
  stock: availabilitySchema.default(NO_STOCK),
})
export type FitResult = z.infer<typeof fitResultSchema>

/** Answers shown per group (kind, relation, reviewed or inferred) unless asked otherwise. */
export const FIT_PAGE_SIZE_DEFAULT = 20
export const FIT_PAGE_SIZE_MAX = 200

const wholeNumber = (what: string, min: number, max: number) =>
  z.coerce
    .number({ error: () => `${what} must be a number.` })
    .int(`${what} must be a whole number.`)
    .min(min, `${what} must be at least ${min}.`)
    .max(max, `${what} must be at most ${max}.`)

export const fitsQuerySchema = z.object({
  relation: relationSchema.optional(),
  kind: partKindSchema.optional(),
  inferred: z
    .enum(['0', '1', 'true', 'false'], { error: () => 'Inferred must be 0 or 1.' })
    .optional()
    .transform((value) => value !== '0' && value !== 'false'),
  /** Only parts with a unit available on a shelf. */
  inStock: z
    .enum(['0', '1', 'true', 'false'], { error: () => 'In stock must be 0 or 1.' })
    .optional()
    .transform((value) => value === '1' || value === 'true'),
  /** The page of every group, from 1; each group says how many answers it holds in all. */
  page: wholeNumber('Page', 1, 100_000).default(1),
  pageSize: wholeNumber('Page size', 1, FIT_PAGE_SIZE_MAX).default(FIT_PAGE_SIZE_DEFAULT),
})
export type FitsQuery = z.output<typeof fitsQuerySchema>

/** Reviewed links and the rules' inferences are counted and paged apart. */
export const FIT_SOURCES = ['reviewed', 'inferred'] as const
export type FitSource = (typeof FIT_SOURCES)[number]

/** One kind and relation of answers, from reviewed links or from the rules: its total and one page of it in part-number order. */
export const fitGroupSchema = z.object({
  kind: partKindSchema,
  relation: relationSchema,
  source: z.enum(FIT_SOURCES),
  total: z.number().int(),
  /** How many answers of the group come before this page. */
  offset: z.number().int(),
  results: z.array(fitResultSchema),
})
export type FitGroupPage = z.infer<typeof fitGroupSchema>

export const fitsResponseSchema = z.object({
  part: partSchema,
  /** The mark the address named, when it was not the part's own number (a superseded number says so). */
  resolvedFrom: resolvedFromSchema.nullable(),
  identical: z.array(partSchema),
  page: z.number().int(),
  pageSize: z.number().int(),
  /** Kind in catalogue order, then relation (what works first), reviewed before inferred. */
  groups: z.array(fitGroupSchema),
})
export type FitsResponse = z.infer<typeof fitsResponseSchema>
