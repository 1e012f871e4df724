import type { PartAttributes } from '../../shared/schemas/part-attributes'

/** A part as the figures read it: only its attributes matter here. */
type WithAttributes = { attributes: PartAttributes } | undefined

/** An attribute that is a finite number, else undefined (a figure then leaves itself out). */
export function num(part: WithAttributes, name: string): number | undefined {
  const value = part?.attributes[name]
  return typeof value === 'number' && Number.isFinite(value) ? value : undefined
}

export function text(part: WithAttributes, name: string): string | undefined {
  const value = part?.attributes[name]
  return typeof value === 'string' ? value : undefined
}

export function bool(part: WithAttributes, name: string): boolean | undefined {
  const value = part?.attributes[name]
  return typeof value === 'boolean' ? value : undefined
}
