import { z } from 'zod'
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

export const modificationSchema = z.object({
  name: z.string(),
  title: z.string(),
  summary: z.string(),
  steps: z.array(z.string()),
  extraParts: z.array(extraPartSchema),
  consumables: z.array(z.string()),
  skillLevel: skillLevelSchema,
  timeMinutes: z.number().int().nullable(),
  cautions: z.array(z.string()),
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
})
export type FitResult = z.infer<typeof fitResultSchema>

/** Inferred answers per kind and relation unless asked otherwise. */
export const INFERRED_LIMIT_DEFAULT = 50

export const fitsQuerySchema = z.object({
  relation: relationSchema.optional(),
  kind: partKindSchema.optional(),
  inferred: z
    .enum(['0', '1', 'true', 'false'])
    .optional()
    .transform((value) => value !== '0' && value !== 'false'),
  /** Most inferred results per kind and relation; the answer says how many more there are. */
  inferredLimit: z.coerce.number().int().min(1).max(500).default(INFERRED_LIMIT_DEFAULT),
})


export const fitsResponseSchema = z.object({
  part: partSchema,
  identical: z.array(partSchema),
  results: z.array(fitResultSchema),
  /** Kinds and relations whose inferred results were cut to the limit. */
  truncated: z.array(z.object({ kind: partKindSchema, relation: relationSchema, shown: z.number().int(), total: z.number().int() })),
})
export type FitsResponse = z.infer<typeof fitsResponseSchema>
