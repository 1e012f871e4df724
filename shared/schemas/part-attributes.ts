import { z } from 'zod'
import type { PartKind } from './part-kinds'

/*
 * Typed attributes per part kind. Every field is optional (catalogue data is
 * rarely complete); a value that is given must have the right type and range.
 * Attributes not known for a kind are kept as text.
 */
const mm = z.number().positive()
const count = z.number().int().positive()
const code = z.string().trim().min(1).max(40)
const unknownAttribute = z.union([z.string(), z.number(), z.boolean()])

/** ISO metric thread notation, e.g. M11x1.5 (diameter x pitch, mm). */
export const metricThreadSchema = z.string().regex(/^M\d+(\.\d+)?x\d+(\.\d+)?$/, 'Thread must read like M11x1.5 (diameter x pitch in mm).')

/** Boss heights per head-bolt position in the manual's tightening order, mm, separated by ";" (e.g. 98;98;96.5;98). */
export const bossHeightsSchema = z
  .string()
  .trim()
  .regex(
    /^\d+(\.\d+)?(\s*;\s*\d+(\.\d+)?){0,31}$/,
    'Boss heights are mm per bolt position in tightening order, separated by ";" (like 98;98;96.5).',
  )

export const TOOTH_PROFILES = ['trapezoidal', 'curvilinear', 'modified-curvilinear'] as const
const toothProfile = z.enum(TOOTH_PROFILES)
const toothed = { teeth: count, pitchMm: mm, profile: toothProfile, widthMm: mm }

export const MATERIALS = ['cast-iron', 'aluminium', 'steel'] as const
export const DIAGNOSTIC_GENERATIONS = ['pre-obd', 'obd-i', 'obd-ii'] as const
/** Distributor pickups; an inductive one gives an AC signal, Hall-effect and optical ones a square wave. */
export const PICKUP_TYPES = ['inductive', 'hall-effect', 'optical'] as const
/** The signal a control unit's ignition input reads. */
export const IGNITION_INPUTS = ['inductive', 'square-wave'] as const

export const attributeShapes = {
  block: {
    cylinders: z.number().int().min(1).max(16),
    boreMm: mm,
    strokeMm: mm,
    deckClearanceMm: z.number().min(-5).max(5),
    pistonVolumeCc: z.number().min(-50).max(50),
    headBoltPattern: code,
    headBoltThread: metricThreadSchema,
    headBoltCount: count,
    tappedDepthMm: mm,
    material: z.enum(MATERIALS),
    oilRestrictor: z.boolean(),
    crankToDeckMm: mm,
    tensionerRangeMm: z.number().min(0).max(20),
    crankSnout: code,
  },
  head: {
    chamberCc: mm,
    headBoltPattern: code,
    boltBossHeightMm: mm,
    distributorMount: code,
    valveLift: z.enum(['fixed', 'variable']),
    oilRestrictor: z.boolean(),
    intakePortPattern: code,
    exhaustPortPattern: code,
    camNose: code,
    camAboveDeckMm: mm,
    material: z.enum(MATERIALS),
    /** Where one boss differs (a repaired corner), the height at every bolt position. */
    bossHeightsMm: bossHeightsSchema,
    /** Metal machined off the gasket face; chamber volume and heights are the skimmed head's own. */
    skimmedMm: z.number().min(0).max(3),
  },
  'head-gasket': {
    boreMm: mm,
    compressedThicknessMm: mm,
    headBoltPattern: code,
    construction: z.enum(['multi-layer-steel', 'composite', 'copper']),
  },
  'head-bolt': {
    thread: metricThreadSchema,
    lengthMm: mm,
    torqueToYield: z.boolean(),
    setQuantity: count,
    washerThicknessMm: z.number().min(0).max(20),
  },
  distributor: {
    mountPattern: code,
    capStyle: code,
    internals: code,
    internalsTransferable: z.boolean(),
    pickupType: z.enum(PICKUP_TYPES),
    /** How deep the drive dog sits in the cam slot with the body on its own flange. */
    driveDogDepthMm: mm,
    /** How much longer the listed service drive dog is, where one exists. */
    longerDogMm: mm,
  },
  'ignition-leads': { capStyle: code, cylinders: count },
  ecu: {
    diagnosticGeneration: z.enum(DIAGNOSTIC_GENERATIONS),
    variableValveLift: z.boolean(),
    vvlLampWhenAbsent: z.enum(['off', 'on']),
    connector: code,
    injectorImpedance: z.enum(['high', 'low']),
    /** The injector flow the unit's fuel map assumes, and the pressure it is rated at. */
    calibratedInjectorCcMin: mm,
    calibratedInjectorPressureBar: mm,
    ignitionInput: z.enum(IGNITION_INPUTS),
  },
  harness: { connector: code, vvlLeads: z.boolean(), injectorPlug: code },
  'intake-manifold': { portPattern: code, fuelRailMount: code },
  /** An adapter gasket has a head side and a manifold side instead of one port pattern. */
  'intake-gasket': { portPattern: code, headPortPattern: code, manifoldPortPattern: code },
  'exhaust-manifold': { portPattern: code },
  'exhaust-gasket': { portPattern: code },
  'fuel-rail': { fuelRailMount: code, injectorCupMm: mm, outlets: count, pressureBar: mm },
  injector: {
    flowCcMin: mm,
    ratedPressureBar: mm,
    sealMm: mm,
    impedance: z.enum(['high', 'low']),
    plug: code,
  },
  'cam-gear': { ...toothed, camNose: code },
  'timing-belt': toothed,
  'crank-pulley': { ...toothed, crankSnout: code },
  'oil-restrictor': { orificeMm: mm },
  other: { thicknessMm: mm, innerDiameterMm: mm, quantityPerPack: count, adaptsFromMount: code, adaptsToMount: code },
} satisfies Record<PartKind, z.ZodRawShape>

function attributesSchema<S extends z.ZodRawShape>(shape: S) {
  return z.object(shape).partial().catchall(unknownAttribute)
}

export const partAttributeSchemas = Object.fromEntries(
  Object.entries(attributeShapes).map(([kind, shape]) => [kind, attributesSchema(shape)]),
) as { [K in PartKind]: ReturnType<typeof attributesSchema<(typeof attributeShapes)[K]>> }

export type PartAttributes = Record<string, string | number | boolean>

/** Names and types of the attributes known for a kind (for CSV typing and forms). */
export function knownAttributes(kind: PartKind): { name: string; type: 'number' | 'boolean' | 'text' }[] {
  return Object.entries(attributeShapes[kind] as z.ZodRawShape).map(([name, schema]) => ({
    name,
    type: schema instanceof z.ZodNumber ? 'number' : schema instanceof z.ZodBoolean ? 'boolean' : 'text',
  }))
}

/** The positions of a bossHeightsMm value, numbered from 1 in tightening order; null when it does not read. */
export function parseBossHeights(value: unknown): { position: string; bossHeightMm: number }[] | null {
  if (typeof value !== 'string' || !bossHeightsSchema.safeParse(value).success) return null
  return value.split(';').map((height, index) => ({ position: String(index + 1), bossHeightMm: Number(height.trim()) }))
}

export function parseMetricThread(thread: string): { diameterMm: number; pitchMm: number } | null {
  const match = /^M(\d+(?:\.\d+)?)x(\d+(?:\.\d+)?)$/.exec(thread)
  if (!match) return null
  return { diameterMm: Number(match[1]), pitchMm: Number(match[2]) }
}
