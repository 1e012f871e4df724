import { z } from 'zod'
import { partSchema } from './part'
import { slotRecord } from './slot-record'
import { availabilitySchema, NO_STOCK, stockConditionSchema } from './stock'
import { explanationStepSchema, extraPartSchema, modificationSchema, relationSchema, verdictSchema } from './fitment'

/** Slot -> part number. A list is accepted only to answer "two parts in one slot" clearly. */
export const slotsInputSchema = slotRecord(
  z.union([z.string().trim().min(1, 'Give a part number.').max(100), z.array(z.string().trim().max(100))]),
)

const roughness = (label: string) =>
  z
    .number({ error: () => `${label} must be a number of µm Ra.` })
    .positive(`${label} must be above zero.`)
    .max(25, `${label} must be at most 25 µm Ra.`)
    .optional()
const flatness = (label: string) =>
  z
    .number({ error: () => `${label} must be a number of mm.` })
    .min(0, `${label} cannot be below zero.`)
    .max(2, `${label} must be at most 2 mm.`)
    .optional()

/** The faces as measured on this engine: average roughness (µm Ra) and out-of-flat over the face (mm). */
export const faceFinishSchema = z.object({
  deckRaUm: roughness('Deck finish'),
  deckFlatnessMm: flatness('Deck out-of-flat'),
  headRaUm: roughness('Head face finish'),
  headFlatnessMm: flatness('Head face out-of-flat'),
})
export type FaceFinish = z.infer<typeof faceFinishSchema>
export const FACE_FINISH_FIELDS = Object.keys(faceFinishSchema.shape) as (keyof FaceFinish)[]

/** The measured faces of a build's context, or null when none was measured (as a sheet stores it). */
export function faceFinishOf(context: FaceFinish): FaceFinish | null {
  const measured = Object.fromEntries(
    FACE_FINISH_FIELDS.flatMap((field) => (context[field] === undefined ? [] : [[field, context[field]]])),
  )
  return Object.keys(measured).length ? (measured as FaceFinish) : null
}

export const buildContextSchema = z.object({
  targetPowerKw: z
    .number({ error: () => 'Target power must be a number of kW.' })
    .positive('Target power must be above zero.')
    .max(2000, 'Target power must be at most 2000 kW.')
    .optional(),
  fuelOctane: z
    .number({ error: () => 'Octane must be a number.' })
    .min(80, 'Octane must be between 80 and 120.')
    .max(120, 'Octane must be between 80 and 120.')
    .optional(),
  chassisModelYear: z
    .number({ error: () => 'Model year must be a year, like 1999.' })
    .int('Model year must be a whole year, like 1999.')
    .min(1900, 'Model year must be between 1900 and 2100.')
    .max(2100, 'Model year must be between 1900 and 2100.')
    .optional(),
  vin: z.string().trim().max(17, 'A VIN has 17 characters.').optional(),
  /** The vehicle application the build was planned from ("Plan from this vehicle"): its make and model go on a quote. */
  vehicleId: z
    .number({ error: () => 'Give a vehicle application id.' })
    .int()
    .positive('Give a vehicle application id.')
    .optional(),
  /** The job takes the engine out of the car (lifting cautions apply). */
  engineOut: z.boolean().optional(),
  /** The build removes or disables an emission control (catalyst, EGR, evaporative). */
  emissionControlsRemoved: z.boolean().optional(),
  ...faceFinishSchema.shape,
})
export type BuildContext = z.infer<typeof buildContextSchema>

export const evaluateRequestSchema = buildContextSchema.extend({ slots: slotsInputSchema })
export type EvaluateRequest = z.infer<typeof evaluateRequestSchema>

export const cautionSchema = z.object({
  severity: z.enum(['info', 'warning', 'danger']),
  text: z.string(),
  reference: z.string().optional(),
  /** The service manual section that governs this work, shown beside the caution. */
  manual: z.string().optional(),
  ruleId: z.string().optional(),
  compliance: z.enum(['check', 'blocked']).optional(),
})
export type Caution = z.infer<typeof cautionSchema>

export const pairJudgementSchema = z.object({
  slots: z.tuple([z.string(), z.string()]),
  label: z.string(),
  partNumbers: z.tuple([z.string(), z.string()]),
  relation: verdictSchema,
  decidedBy: z.enum(['link', 'rule', 'none']),
  /** What decided: the failing rule's or link's text, or the modification's; shown first. */
  reason: z.string(),
  ruleIds: z.array(z.string()),
  modifications: z.array(z.string()),
  explanation: z.array(explanationStepSchema),
  /** Field reports on the reviewed link that decided the pair (none when the rules decided). */
  fieldReports: z.object({ confirmed: z.number().int(), contradicted: z.number().int() }).default({ confirmed: 0, contradicted: 0 }),
  /** The deciding link's two parts (possibly identical to the chosen ones): its field reports are on it. */
  linkParts: z.tuple([z.string(), z.string()]).optional(),
})
export type PairJudgement = z.infer<typeof pairJudgementSchema>

/** One unit on the shelf that a parts-list line takes. */
export const shelfUnitSchema = z.object({
  stockItemId: z.number().int(),
  site: z.string(),
  location: z.string(),
  condition: stockConditionSchema,
  priceCents: z.number().int(),
})
export type ShelfUnit = z.infer<typeof shelfUnitSchema>

export const partsListLineSchema = z.object({
  partNumber: z.string().optional(),
  description: z.string(),
  quantity: z.number(),
  unit: z.string(),
  reason: z.string(),
  category: z.enum(['chosen', 'modification', 'consumable']),
  /** For a line with a part number: the units to take off the shelf, and how many are left to order. */
  shelf: z.object({ take: z.array(shelfUnitSchema), toOrder: z.number() }).optional(),
})
export type PartsListLine = z.infer<typeof partsListLineSchema>

export const buildFiguresSchema = z.object({
  displacementCc: z.number().nullable(),
  compressionRatio: z.number().nullable(),
  sweptVolumeCc: z.number().nullable(),
  clearanceVolumeCc: z.number().nullable(),
  injectorHeadroomPct: z.number().nullable(),
  injectorNeededCcMin: z.number().nullable(),
  injectorAvailableCcMin: z.number().nullable(),
  headBoltProjectionMm: z.number().nullable(),
  threadEngagementMinMm: z.number().nullable(),
  headBoltMaxProjectionMm: z.number().nullable(),
  headBoltLengthRangeMm: z.object({ min: z.number(), max: z.number() }).nullable(),
  washerStackMm: z.number().nullable(),
  camCrankCentreMm: z.number().nullable(),
  beltCentreShiftMm: z.number().nullable(),
  beltTeethNeeded: z.number().nullable(),
  quenchMm: z.number().nullable(),
  chassisModelYear: z.number().nullable(),
})
export type BuildFigures = z.infer<typeof buildFiguresSchema>

export const appliedModificationSchema = modificationSchema.extend({
  slots: z.tuple([z.string(), z.string()]),
  reason: z.string(),
})
export type AppliedModification = z.infer<typeof appliedModificationSchema>

/** Road-legality beside the mechanical verdict: a fit can still be illegal on the road. */
export const complianceSchema = z.object({
  status: z.enum(['ok', 'check', 'blocked']),
  reasons: z.array(z.string()),
})
export type Compliance = z.infer<typeof complianceSchema>

export const evaluationSchema = z.object({
  verdict: verdictSchema,
  compliance: complianceSchema,
  missingSlots: z.array(z.string()),
  pairs: z.array(pairJudgementSchema),
  modifications: z.array(appliedModificationSchema),
  partsList: z.array(partsListLineSchema),
  cautions: z.array(cautionSchema),
  figures: buildFiguresSchema,
  parts: z.record(z.string(), partSchema),
})
export type Evaluation = z.infer<typeof evaluationSchema>

export const completeRequestSchema = evaluateRequestSchema.extend({
  limit: z.number().int().min(1).max(50).default(10),
  /** Only these empty slots (a slot picker needs one); all empty slots when left out. */
  only: z.array(z.string()).max(20).optional(),
})

export const candidateSchema = z.object({
  part: partSchema,
  relation: relationSchema,
  modifications: z.array(z.string()),
  score: z.number(),
  reasons: z.array(z.string()),
  /** Why it is ranked below parts with more modifications: legal blockers and new danger cautions it brings. */
  setBackFor: z.array(z.string()),
  /** What is on the shelf of the candidate, as on a what-fits line. */
  stock: availabilitySchema.default(NO_STOCK),
})
export type Candidate = z.infer<typeof candidateSchema>

export const completionSchema = z.object({
  slots: z.record(
    z.string(),
    z.object({
      matesWith: z.array(z.string()),
      candidates: z.array(candidateSchema),
      note: z.string().optional(),
    }),
  ),
})
export type Completion = z.infer<typeof completionSchema>

export const fillResultSchema = z.object({
  slots: z.record(z.string(), z.string()),
  filled: z.array(z.object({ slot: z.string(), partNumber: z.string() })),
  unfilled: z.array(z.object({ slot: z.string(), note: z.string() })),
  /** Parts fill the gaps passed over, and why (not road-legal, a danger caution, a dead end). */
  skipped: z.array(z.object({ slot: z.string(), partNumber: z.string(), reason: z.string() })),
})
export type FillResult = z.infer<typeof fillResultSchema>

/** Ticked checklist steps: modification name -> indexes of its ticked steps. */
export const checklistTicksSchema = z
  .record(z.string().trim().min(1).max(80), z.array(z.number().int().min(0).max(199)).max(200))
  .refine((ticks) => Object.keys(ticks).length <= 200, 'At most 200 modifications on a checklist.')
export type ChecklistTicks = z.infer<typeof checklistTicksSchema>

export const buildSheetInputSchema = buildContextSchema.extend({
  name: z.string().trim().min(1, 'Give the build a name.').max(120),
  slots: slotRecord(z.string().trim().min(1).max(100)),
  notes: z.string().max(4000).default(''),
  checklist: checklistTicksSchema.default({}),
})
export type BuildSheetInput = z.infer<typeof buildSheetInputSchema>

/** Rename, re-slot or change the context of a saved sheet; null clears a value. */
export const buildSheetUpdateSchema = z
  .object({
    name: z.string().trim().min(1, 'Give the build a name.').max(120),
    slots: slotRecord(z.string().trim().min(1).max(100)),
    targetPowerKw: buildContextSchema.shape.targetPowerKw.unwrap().nullable(),
    fuelOctane: buildContextSchema.shape.fuelOctane.unwrap().nullable(),
    chassisModelYear: buildContextSchema.shape.chassisModelYear.unwrap().nullable(),
    vin: buildContextSchema.shape.vin.unwrap().nullable(),
    vehicleId: buildContextSchema.shape.vehicleId.unwrap().nullable(),
    faceFinish: faceFinishSchema.nullable(),
    notes: z.string().max(4000),
    checklist: checklistTicksSchema,
  })
  .partial()
  .refine((value) => Object.keys(value).length > 0, 'Change at least one field.')
export type BuildSheetUpdate = z.infer<typeof buildSheetUpdateSchema>

export const buildSheetSchema = z.object({
  id: z.number().int(),
  name: z.string(),
  slots: z.record(z.string(), z.string()),
  targetPowerKw: z.number().nullable(),
  fuelOctane: z.number().nullable(),
  chassisModelYear: z.number().nullable(),
  vin: z.string().nullable(),
  /** The vehicle application it was planned from (null for one planned from parts alone, or saved before this was kept). */
  vehicleId: z.number().int().nullable().default(null),
  /** Deck and head face as measured (null when not measured). */
  faceFinish: faceFinishSchema.nullable().default(null),
  notes: z.string(),
  checklist: z.record(z.string(), z.array(z.number().int())).default({}),
  /** The verdict and labour as of the last save (null for a sheet saved before they were kept). */
  verdict: verdictSchema.nullable().default(null),
  labourMinutes: z.number().int().nullable().default(null),
  owner: z.object({ id: z.number().int(), name: z.string() }),
  createdAt: z.string(),
  updatedAt: z.string(),
})
export type BuildSheet = z.infer<typeof buildSheetSchema>

/** What a saved sheet keeps of a build's context, as a context again (nothing for what it does not hold). */
export type SheetContext = Pick<BuildSheet, 'targetPowerKw' | 'fuelOctane' | 'chassisModelYear' | 'vin' | 'faceFinish'> & {
  vehicleId?: number | null
}

/** A saved sheet's context as the planner, an evaluation or a quote takes it. */
export function sheetContext(sheet: SheetContext): BuildContext {
  return {
    ...(sheet.targetPowerKw !== null && { targetPowerKw: sheet.targetPowerKw }),
    ...(sheet.fuelOctane !== null && { fuelOctane: sheet.fuelOctane }),
    ...(sheet.chassisModelYear !== null && { chassisModelYear: sheet.chassisModelYear }),
    ...(sheet.vin && { vin: sheet.vin }),
    ...(sheet.vehicleId != null && { vehicleId: sheet.vehicleId }),
    ...sheet.faceFinish,
  }
}
export const buildSheetListSchema = z.array(buildSheetSchema)

export { extraPartSchema }
