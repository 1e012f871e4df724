/**
 * Input guards shared by the engineering formulas. A formula fed a zero bore or a NaN would
 * otherwise return a plausible-looking number on a parts list, so bad input fails loudly.
 */

export function requireFinite(value: number, name: string): number {
  if (!Number.isFinite(value)) throw new RangeError(`${name} must be a finite number, got ${value}`)
  return value
}

export function requirePositive(value: number, name: string): number {
  if (!Number.isFinite(value) || value <= 0) {
    throw new RangeError(`${name} must be a positive number, got ${value}`)
  }
  return value
}

export function requireNonNegative(value: number, name: string): number {
  if (!Number.isFinite(value) || value < 0) {
    throw new RangeError(`${name} must be zero or positive, got ${value}`)
  }
  return value
}

export function requirePositiveInteger(value: number, name: string): number {
  if (!Number.isInteger(value) || value <= 0) {
    throw new RangeError(`${name} must be a positive whole number, got ${value}`)
  }
  return value
}
