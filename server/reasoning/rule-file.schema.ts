import { z } from 'zod'
import { mates } from '../../shared/build-template'
import { SLOT_IDS } from '../../shared/build-template'
import { modificationCautionSchema, skillLevelSchema } from '../../shared/schemas/fitment'

/*
 * The shape of a rule file under rules/. Conditions are json-rules-engine
 * conditions limited to our own operators, which are false whenever a value
 * they compare is missing: a rule never fires on data it does not have.
 */
export const OPERATORS = ['is', 'isNot', 'below', 'atMost', 'above', 'atLeast', 'present', 'absent', 'twiceOf', 'notTwiceOf'] as const

/** Facts a rule may read: each slot's attributes (by kind), the build's figures, its input and its filled slots. */
export const FACT_NAMES = [...SLOT_IDS, 'figures', 'input', 'slots'] as const

const factName = z.enum(FACT_NAMES, { error: (issue) => `unknown fact "${String(issue.input)}"` })
const path = z.string().regex(/^\$\.[A-Za-z0-9_-]+(\.[A-Za-z0-9_-]+)*$/, 'path must read like $.name or $.a.b')
const factRef = z.object({ fact: factName, path }).strict()
const scalar = z.union([z.string(), z.number(), z.boolean()])

export type Condition =
  { all: Condition[] } | { any: Condition[] } | { not: Condition } | { fact: string; path?: string; operator: string; value: unknown }

const leafSchema = z
  .object({
    fact: factName,
    path: path.optional(),
    operator: z.enum(OPERATORS, { error: (issue) => `unknown operator "${String(issue.input)}"` }),
    value: z.union([scalar, factRef]),
  })
  .strict()
const allSchema = z.object({ all: z.array(z.lazy(() => conditionSchema)).min(1) }).strict()
const anySchema = z.object({ any: z.array(z.lazy(() => conditionSchema)).min(1) }).strict()
const notSchema = z.object({ not: z.lazy(() => conditionSchema) }).strict()

function schemaFor(value: unknown): z.ZodType {
  if (value && typeof value === 'object') {
    if ('all' in value) return allSchema
    if ('any' in value) return anySchema
    if ('not' in value) return notSchema
  }
  return leafSchema
}

/*
 * Chooses the condition's schema by its key, so a fault is reported where it
 * is ("unknown operator"), not as a failed union of every shape.
 */
export const conditionSchema: z.ZodType<Condition> = z.custom<Condition>().superRefine((value, ctx) => {
  const result = schemaFor(value).safeParse(value)
  if (!result.success) {
    for (const issue of result.error.issues) ctx.addIssue({ code: 'custom', path: issue.path, message: issue.message })
  }
})

const topCondition = conditionSchema.refine(
  (value) => typeof value === 'object' && value !== null && ('all' in value || 'any' in value || 'not' in value),
  'conditions must start with all, any or not',
)

const template = z.string().min(1)
const findPartSchema = z.object({ kind: z.string(), attributes: z.record(z.string(), template).optional() }).strict()
export const ruleExtraPartSchema = z
  .object({
    description: template,
    quantity: z.union([z.number().positive(), template]),
    partNumber: z.string().optional(),
    findPart: findPartSchema.optional(),
  })
  .strict()
export type RuleExtraPart = z.infer<typeof ruleExtraPartSchema>

const eventSchema = z.discriminatedUnion('type', [
  z.object({
    type: z.literal('relation'),
    params: z.object({ relation: z.enum(['fits', 'does-not-fit']), reason: template }).strict(),
  }),
  z.object({
    type: z.literal('modification'),
    params: z.object({ modification: z.string(), reason: template, extraParts: z.array(ruleExtraPartSchema).optional() }).strict(),
  }),
  z.object({
    type: z.literal('extra-part'),
    params: ruleExtraPartSchema.extend({ reason: template }).strict(),
  }),
  z.object({
    type: z.literal('caution'),
    params: z
      .object({
        severity: z.enum(['info', 'warning', 'danger']),
        text: template,
        reference: z.string().optional(),
        /** The service manual section that governs, e.g. "head bolt torque sequence and angle". */
        manual: z.string().optional(),
        /** A legal problem: "blocked" takes road-legality away, "check" asks for a check first. */
        compliance: z.enum(['check', 'blocked']).optional(),
      })
      .strict(),
  }),
])
export type RuleEvent = z.infer<typeof eventSchema>

const slotPair = z.tuple([z.enum(SLOT_IDS), z.enum(SLOT_IDS)])

export const ruleSchema = z
  .object({
    name: z.string().min(1),
    pair: slotPair.optional(),
    priority: z.number().int().min(1).max(100).optional(),
    conditions: topCondition,
    event: eventSchema,
  })
  .strict()
export type RuleSpec = z.infer<typeof ruleSchema>

export const ruleFileSchema = z
  .object({
    id: z.string().regex(/^[a-z0-9-]+$/, 'id is kebab-case'),
    title: z.string().min(1),
    description: z.string().min(1),
    source: z.string().min(1),
    scope: z.enum(['pair', 'build']),
    pair: slotPair.optional(),
    /**
     * The rules judge this engine's measured condition (given with the build), not the parts:
     * their modifications apply on top of a reviewed link, which only knows the parts.
     */
    measured: z.boolean().optional(),
    rules: z.array(ruleSchema).min(1),
  })
  .strict()
  .superRefine((file, ctx) => {
    const names = new Set<string>()
    file.rules.forEach((rule, index) => {
      if (names.has(rule.name))
        ctx.addIssue({ code: 'custom', path: ['rules', index, 'name'], message: `duplicate rule name "${rule.name}"` })
      names.add(rule.name)
      const pair = rule.pair ?? file.pair
      if (file.scope === 'pair') {
        if (!pair) ctx.addIssue({ code: 'custom', path: ['rules', index, 'pair'], message: 'a pair rule needs a pair of slots' })
        else if (!mates(pair[0], pair[1])) {
          ctx.addIssue({
            code: 'custom',
            path: ['rules', index, 'pair'],
            message: `${pair[0]} and ${pair[1]} are not a mating pair of the build template`,
          })
        }
      } else {
        if (pair)
          ctx.addIssue({ code: 'custom', path: ['rules', index, 'pair'], message: 'a build rule judges the whole build, not a pair' })
        if (rule.event.type === 'relation' || rule.event.type === 'modification') {
          ctx.addIssue({
            code: 'custom',
            path: ['rules', index, 'event', 'type'],
            message: 'a build rule may only add cautions and extra parts',
          })
        }
      }
    })
  })
export type RuleFile = z.infer<typeof ruleFileSchema>

export const modificationSpecSchema = z
  .object({
    name: z.string().regex(/^[a-z0-9-]+$/, 'name is kebab-case'),
    title: z.string().min(1),
    summary: z.string(),
    steps: z.array(z.string()).min(1),
    extraParts: z.array(z.object({ description: z.string(), quantity: z.number().positive(), partNumber: z.string().optional() }).strict()),
    consumables: z.array(z.string()),
    skillLevel: skillLevelSchema,
    timeMinutes: z.number().int().positive().nullable(),
    cautions: z.array(modificationCautionSchema),
  })
  .strict()
export type ModificationSpec = z.infer<typeof modificationSpecSchema>

export const consumableSpecSchema = z
  .object({
    id: z.string().regex(/^[a-z0-9-]+$/),
    whenSlot: z.enum(SLOT_IDS),
    unlessSlot: z.enum(SLOT_IDS).optional(),
    description: z.string().min(1),
    quantity: z.union([z.number().positive(), z.literal('per-cylinder')]),
    unit: z.string().min(1),
    reason: z.string().min(1),
  })
  .strict()
export type ConsumableSpec = z.infer<typeof consumableSpecSchema>
