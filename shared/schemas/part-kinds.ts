import { z } from 'zod'

/** Part kinds as stored and as used in CSV files and build slots. */
export const PART_KINDS = [
  'block',
  'head',
  'head-gasket',
  'head-bolt',
  'distributor',
  'ignition-leads',
  'ecu',
  'harness',
  'intake-manifold',
  'intake-gasket',
  'exhaust-manifold',
  'exhaust-gasket',
  'fuel-rail',
  'injector',
  'cam-gear',
  'timing-belt',
  'crank-pulley',
  'oil-restrictor',
  'other',
] as const

export const partKindSchema = z.enum(PART_KINDS, {
  error: () => `Kind must be one of: ${PART_KINDS.join(', ')}.`,
})
export type PartKind = z.infer<typeof partKindSchema>

export const PART_KIND_LABELS: Record<PartKind, string> = {
  block: 'Cylinder block',
  head: 'Cylinder head',
  'head-gasket': 'Head gasket',
  'head-bolt': 'Head bolt set',
  distributor: 'Ignition distributor',
  'ignition-leads': 'Ignition lead set',
  ecu: 'Engine control unit',
  harness: 'Engine harness',
  'intake-manifold': 'Intake manifold',
  'intake-gasket': 'Intake gasket',
  'exhaust-manifold': 'Exhaust manifold',
  'exhaust-gasket': 'Exhaust gasket',
  'fuel-rail': 'Fuel rail',
  injector: 'Fuel injector',
  'cam-gear': 'Cam gear',
  'timing-belt': 'Timing belt',
  'crank-pulley': 'Crank pulley',
  'oil-restrictor': 'Oil restrictor',
  other: 'Other part',
}
