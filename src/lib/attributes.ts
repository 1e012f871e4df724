/** Units carried in attribute names, longest first (flowCcMin is cc/min, not cc). */
const UNIT_SUFFIXES: [suffix: string, unit: string][] = [
  ['CcMin', 'cc/min'],
  ['Mm', 'mm'],
  ['Cc', 'cc'],
  ['Bar', 'bar'],
  ['Kw', 'kW'],
]

/** Names that read badly when split mechanically. */
const OVERRIDES: Record<string, string> = {
  vvlLeads: 'Valve-lift leads',
  vvlLampWhenAbsent: 'Engine lamp when valve-lift solenoid is absent',
  variableValveLift: 'Variable valve lift',
  diagnosticGeneration: 'Diagnostics',
  internalsTransferable: 'Internals can move to another housing',
  oilRestrictor: 'Restricts the head oil feed',
}

export type AttributeRow = { name: string; label: string; value: string }

function words(camel: string): string {
  const spaced = camel.replace(/([a-z0-9])([A-Z])/g, '$1 $2').toLowerCase()
  return spaced.charAt(0).toUpperCase() + spaced.slice(1)
}

/** A readable label with its unit, e.g. chamberCc -> "Chamber (cc)". */
export function attributeLabel(name: string): string {
  const override = OVERRIDES[name]
  if (override) return override
  for (const [suffix, unit] of UNIT_SUFFIXES) {
    if (name.endsWith(suffix) && name.length > suffix.length) return `${words(name.slice(0, -suffix.length))} (${unit})`
  }
  return words(name)
}

export function attributeValue(value: string | number | boolean): string {
  if (typeof value === 'boolean') return value ? 'Yes' : 'No'
  return String(value)
}

export function attributeRows(attributes: Record<string, string | number | boolean>): AttributeRow[] {
  return Object.entries(attributes).map(([name, value]) => ({ name, label: attributeLabel(name), value: attributeValue(value) }))
}
