import type { LocationQuery, LocationQueryRaw } from 'vue-router'
import { SLOT_IDS, type SlotId } from '@shared/build-template'
import { FACE_FINISH_FIELDS, type BuildContext, type EvaluateRequest } from '@shared/schemas/build'
import { queryNumber, queryText } from './route-query'

export type PlannerSlots = Partial<Record<SlotId, string>>
export type PlannerState = { slots: PlannerSlots; context: BuildContext }

/** Context fields and the short names they have in the address. */
const CONTEXT_KEYS = {
  targetPowerKw: 'power',
  fuelOctane: 'octane',
  chassisModelYear: 'year',
  vin: 'vin',
  /** The vehicle application it was planned from (Plan from this vehicle), for the quote's make and model. */
  vehicleId: 'vehicle',
  deckRaUm: 'deckRa',
  deckFlatnessMm: 'deckFlat',
  headRaUm: 'headRa',
  headFlatnessMm: 'headFlat',
} as const
type NumberField = Exclude<keyof typeof CONTEXT_KEYS, 'vin' | 'vehicleId'>

/**
 * A build in progress lives in the address (`?block=TM-BL-1800&head=TM-HD-2000&power=110`),
 * so a technician can bookmark it or send it to a colleague.
 */
export function plannerFromQuery(query: LocationQuery): PlannerState {
  const slots: PlannerSlots = {}
  for (const slot of SLOT_IDS) {
    const value = queryText(query[slot])
    if (value) slots[slot] = value
  }
  const context: BuildContext = {}
  for (const field of ['targetPowerKw', 'fuelOctane', 'chassisModelYear', ...FACE_FINISH_FIELDS] as NumberField[]) {
    const value = queryNumber(query[CONTEXT_KEYS[field]])
    if (value !== undefined) context[field] = value
  }
  const vehicleId = queryNumber(query[CONTEXT_KEYS.vehicleId])
  if (vehicleId !== undefined && Number.isInteger(vehicleId) && vehicleId > 0) context.vehicleId = vehicleId
  const vin = queryText(query[CONTEXT_KEYS.vin])
  if (vin) context.vin = vin
  return { slots, context }
}

/** Slots in template order, then the context: the same build always gives the same address. */
export function plannerToQuery(state: PlannerState): Record<string, string> {
  const query: Record<string, string> = {}
  for (const slot of SLOT_IDS) {
    const value = state.slots[slot]?.trim()
    if (value) query[slot] = value
  }
  for (const field of Object.keys(CONTEXT_KEYS) as (keyof typeof CONTEXT_KEYS)[]) {
    const value = state.context[field]
    if (value !== undefined && value !== '') query[CONTEXT_KEYS[field]] = String(value)
  }
  return query
}

/** Whether two addresses describe the same build (ignoring keys that are not the planner's). */
export function sameBuild(a: LocationQuery | LocationQueryRaw, b: Record<string, string>): boolean {
  const fromA = plannerToQuery(plannerFromQuery(a as LocationQuery))
  const keys = new Set([...Object.keys(fromA), ...Object.keys(b)])
  return [...keys].every((key) => fromA[key] === b[key])
}

/** Whether an address holds no slot and no context at all. */
export function isEmptyBuild(query: LocationQuery | LocationQueryRaw): boolean {
  return Object.keys(plannerToQuery(plannerFromQuery(query as LocationQuery))).length === 0
}

export function evaluateBody(state: PlannerState): EvaluateRequest & { slots: Record<string, string> } {
  const slots: Record<string, string> = {}
  for (const [slot, value] of Object.entries(state.slots)) if (value) slots[slot] = value
  return { slots, ...state.context }
}

export function filledSlotCount(slots: PlannerSlots): number {
  return Object.values(slots).filter(Boolean).length
}

/** The build with one slot set (trimmed) or, for an empty value, cleared. */
export function withSlots(state: PlannerState, changes: Partial<Record<SlotId, string | null>>): PlannerState {
  const slots = { ...state.slots }
  for (const [slot, value] of Object.entries(changes) as [SlotId, string | null][]) {
    if (value?.trim()) slots[slot] = value.trim()
    else delete slots[slot]
  }
  return { slots, context: state.context }
}

/** The build with context fields changed; a field set to undefined or '' is dropped. */
export function withContext(state: PlannerState, change: Partial<BuildContext>): PlannerState {
  const context: BuildContext = { ...state.context, ...change }
  for (const key of Object.keys(context) as (keyof BuildContext)[])
    if (context[key] === undefined || context[key] === '') delete context[key]
  return { slots: state.slots, context }
}

/** One key per build, whatever order or spelling the address had (for "has this build been checked?"). */
export function buildKey(state: PlannerState): string {
  return JSON.stringify(plannerToQuery(state))
}
