/**
 * Vehicle identification numbers: check digit per 49 CFR 565.15, year code per the table as
 * amended in 2008 (73 FR 23367). Input is trimmed and upper-cased, since people type VINs.
 */

const VIN_LENGTH = 17
const CHECK_DIGIT_INDEX = 8
const YEAR_INDEX = 9
const CYCLE_INDEX = 6

/** Transliteration table; I, O and Q are never used because they read as 1 and 0. */
const LETTER_VALUES: Readonly<Record<string, number>> = {
  A: 1,
  B: 2,
  C: 3,
  D: 4,
  E: 5,
  F: 6,
  G: 7,
  H: 8,
  J: 1,
  K: 2,
  L: 3,
  M: 4,
  N: 5,
  P: 7,
  R: 9,
  S: 2,
  T: 3,
  U: 4,
  V: 5,
  W: 6,
  X: 7,
  Y: 8,
  Z: 9,
}

const POSITION_WEIGHTS = [8, 7, 6, 5, 4, 3, 2, 10, 0, 9, 8, 7, 6, 5, 4, 3, 2] as const

/** Year codes in cycle order; U, Z and 0 are left out so they cannot be misread. */
const YEAR_CODES = 'ABCDEFGHJKLMNPRSTVWXY123456789'
const FIRST_CYCLE_START = 1980
const CYCLE_YEARS = 30

export type VinValidation = {
  /** Well formed and the check digit matches, as 49 CFR 565 requires in North America. */
  valid: boolean
  /**
   * Seventeen allowed characters regardless of the check digit. Outside North America (ISO 3779)
   * the check digit is optional, so a well-formed VIN with a wrong digit is a warning, not a reject.
   */
  wellFormed: boolean
  checkDigitOk: boolean
  problems: string[]
}

function normalise(vin: string): string {
  return vin.trim().toUpperCase()
}

function charValue(char: string): number | undefined {
  if (char >= '0' && char <= '9') return Number(char)
  return LETTER_VALUES[char]
}

function formProblems(vin: string): string[] {
  const problems: string[] = []
  if (vin.length !== VIN_LENGTH) problems.push(`A VIN has ${VIN_LENGTH} characters; this one has ${vin.length}`)
  const forbidden = [...new Set(vin.replace(/[^IOQ]/g, ''))]
  if (forbidden.length > 0) {
    problems.push(`A VIN never contains ${forbidden.join(', ')}: check for a misread 1 or 0`)
  }
  const other = [...new Set(vin.replace(/[0-9A-Z]/g, ''))]
  if (other.length > 0) problems.push(`A VIN holds only letters and digits; found ${other.map((c) => `"${c}"`).join(', ')}`)
  return problems
}

/** Expected position-9 character: weighted sum mod 11, with 10 written X. */
export function vinCheckDigit(vin: string): string {
  const normalised = normalise(vin)
  const problems = formProblems(normalised)
  if (problems.length > 0) throw new RangeError(problems.join('; '))
  let sum = 0
  for (const [index, weight] of POSITION_WEIGHTS.entries()) {
    sum += (charValue(normalised.charAt(index)) ?? 0) * weight
  }
  const remainder = sum % 11
  return remainder === 10 ? 'X' : String(remainder)
}

export function validateVin(vin: string): VinValidation {
  const normalised = normalise(vin)
  const problems = formProblems(normalised)
  const wellFormed = problems.length === 0
  let checkDigitOk = false
  if (wellFormed) {
    const expected = vinCheckDigit(normalised)
    const actual = normalised.charAt(CHECK_DIGIT_INDEX)
    checkDigitOk = actual === expected
    if (!checkDigitOk) {
      problems.push(`Check digit (position 9) is ${actual} but the other characters give ${expected}: a character may be mistyped`)
    }
  }
  return { valid: wellFormed && checkDigitOk, wellFormed, checkDigitOk, problems }
}

/**
 * Model year from position 10. The codes repeat every 30 years; for light vehicles a letter in
 * position 7 marks the 2010–2039 cycle and a digit the 1980–2009 one. Null when the VIN is not
 * well formed or position 10 is not a year code. The check digit is not required.
 */
export function vinModelYear(vin: string): number | null {
  const normalised = normalise(vin)
  if (formProblems(normalised).length > 0) return null
  const offset = YEAR_CODES.indexOf(normalised.charAt(YEAR_INDEX))
  if (offset < 0) return null
  const laterCycle = /[A-Z]/.test(normalised.charAt(CYCLE_INDEX))
  return FIRST_CYCLE_START + (laterCycle ? CYCLE_YEARS : 0) + offset
}
