import type { PartKind } from './schemas/part-kinds'

/*
 * The engine build template: the slots of an assembly and which slots mate.
 * This is data; the planner, the evaluator, "fill the gaps" and the rule
 * loader all read it from here.
 */
export type SlotId = Exclude<PartKind, 'other'>

export type BuildSlot = {
  id: SlotId
  label: string
  group: 'bottom end' | 'top end' | 'ignition' | 'control' | 'induction' | 'exhaust' | 'fuel' | 'timing drive'
  /** How many of the chosen part a build takes. */
  quantity: 'one' | 'per-cylinder'
  unit: 'piece' | 'set'
}

export type MatingPair = { slots: readonly [SlotId, SlotId]; label: string }

export const BUILD_SLOTS: readonly BuildSlot[] = [
  { id: 'block', label: 'Cylinder block', group: 'bottom end', quantity: 'one', unit: 'piece' },
  { id: 'crank-pulley', label: 'Crank pulley', group: 'timing drive', quantity: 'one', unit: 'piece' },
  { id: 'oil-restrictor', label: 'Oil feed restrictor', group: 'bottom end', quantity: 'one', unit: 'piece' },
  { id: 'head-gasket', label: 'Head gasket', group: 'top end', quantity: 'one', unit: 'piece' },
  { id: 'head', label: 'Cylinder head', group: 'top end', quantity: 'one', unit: 'piece' },
  { id: 'head-bolt', label: 'Head bolts', group: 'top end', quantity: 'one', unit: 'set' },
  { id: 'cam-gear', label: 'Cam gear', group: 'timing drive', quantity: 'one', unit: 'piece' },
  { id: 'timing-belt', label: 'Timing belt', group: 'timing drive', quantity: 'one', unit: 'piece' },
  { id: 'distributor', label: 'Ignition distributor', group: 'ignition', quantity: 'one', unit: 'piece' },
  { id: 'ignition-leads', label: 'Ignition leads', group: 'ignition', quantity: 'one', unit: 'set' },
  { id: 'ecu', label: 'Engine control unit', group: 'control', quantity: 'one', unit: 'piece' },
  { id: 'harness', label: 'Engine harness', group: 'control', quantity: 'one', unit: 'piece' },
  { id: 'intake-manifold', label: 'Intake manifold', group: 'induction', quantity: 'one', unit: 'piece' },
  { id: 'intake-gasket', label: 'Intake gasket', group: 'induction', quantity: 'one', unit: 'piece' },
  { id: 'fuel-rail', label: 'Fuel rail', group: 'fuel', quantity: 'one', unit: 'piece' },
  { id: 'injector', label: 'Injectors', group: 'fuel', quantity: 'per-cylinder', unit: 'piece' },
  { id: 'exhaust-manifold', label: 'Exhaust manifold', group: 'exhaust', quantity: 'one', unit: 'piece' },
  { id: 'exhaust-gasket', label: 'Exhaust gasket', group: 'exhaust', quantity: 'one', unit: 'piece' },
]

export const MATING_PAIRS: readonly MatingPair[] = [
  { slots: ['head', 'block'], label: 'Head on block' },
  { slots: ['head-gasket', 'block'], label: 'Head gasket on block deck' },
  { slots: ['head-gasket', 'head'], label: 'Head gasket under head' },
  { slots: ['head-bolt', 'block'], label: 'Head bolts into block threads' },
  { slots: ['head-bolt', 'head'], label: 'Head bolts through head bosses' },
  { slots: ['oil-restrictor', 'block'], label: 'Oil restrictor in block gallery' },
  { slots: ['crank-pulley', 'block'], label: 'Crank pulley on crank snout' },
  { slots: ['cam-gear', 'head'], label: 'Cam gear on camshaft nose' },
  { slots: ['cam-gear', 'crank-pulley'], label: 'Cam to crank ratio' },
  { slots: ['timing-belt', 'cam-gear'], label: 'Belt on cam gear' },
  { slots: ['timing-belt', 'crank-pulley'], label: 'Belt on crank pulley' },
  { slots: ['distributor', 'head'], label: 'Distributor on head' },
  { slots: ['ignition-leads', 'distributor'], label: 'Leads on distributor cap' },
  { slots: ['distributor', 'ecu'], label: 'Distributor pickup into control unit' },
  { slots: ['ecu', 'head'], label: 'Control unit and valve-lift hardware' },
  { slots: ['ecu', 'harness'], label: 'Control unit connector' },
  { slots: ['ecu', 'injector'], label: 'Injector driver' },
  { slots: ['harness', 'injector'], label: 'Injector plugs' },
  { slots: ['intake-manifold', 'head'], label: 'Intake manifold on head' },
  { slots: ['intake-gasket', 'head'], label: 'Intake gasket on head' },
  { slots: ['intake-gasket', 'intake-manifold'], label: 'Intake gasket under manifold' },
  { slots: ['fuel-rail', 'intake-manifold'], label: 'Fuel rail on manifold' },
  { slots: ['injector', 'fuel-rail'], label: 'Injectors in rail' },
  { slots: ['exhaust-manifold', 'head'], label: 'Exhaust manifold on head' },
  { slots: ['exhaust-gasket', 'head'], label: 'Exhaust gasket on head' },
  { slots: ['exhaust-gasket', 'exhaust-manifold'], label: 'Exhaust gasket under manifold' },
]

export const SLOT_IDS = BUILD_SLOTS.map((slot) => slot.id)

export function isSlotId(value: string): value is SlotId {
  return (SLOT_IDS as readonly string[]).includes(value)
}

/** Key of an unordered pair of kinds, the same whichever way round they are given. */
export function pairKey(a: string, b: string): string {
  return a < b ? `${a}|${b}` : `${b}|${a}`
}

const MATING_KEYS = new Set(MATING_PAIRS.map((pair) => pairKey(pair.slots[0], pair.slots[1])))

export function mates(a: string, b: string): boolean {
  return MATING_KEYS.has(pairKey(a, b))
}

/** The slots a slot mates with, in template order. */
export function matingSlots(slot: string): SlotId[] {
  return MATING_PAIRS.flatMap((pair) => (pair.slots[0] === slot ? [pair.slots[1]] : pair.slots[1] === slot ? [pair.slots[0]] : []))
}
