import fc from 'fast-check'
import { describe, expect, it } from 'vitest'
import { validateVin, vinCheckDigit, vinModelYear } from '../../../shared/engineering/vin'

const CHECK_DIGIT_RULE = '49 CFR 565.15 [published]'
const YEAR_TABLE = '49 CFR 565.15 year table as amended 73 FR 23367 (2008) [published]'

// Letter values from the regulation's transliteration table, written out independently of the code.
const VALUE_GROUPS = ['0', '1AJ', '2BKS', '3CLT', '4DMU', '5ENV', '6FW', '7GPX', '8HY', '9RZ']
const ALLOWED = VALUE_GROUPS.join('')
const valueOf = (char: string): number => VALUE_GROUPS.findIndex((group) => group.includes(char))

function replaceAt(vin: string, index: number, char: string): string {
  return vin.slice(0, index) + char + vin.slice(index + 1)
}

describe(`vinCheckDigit and validateVin (${CHECK_DIGIT_RULE})`, () => {
  it.each([
    ['1G4AH59H45G118341', '4', "the regulation's own worked sample, sum 411 [published]"],
    ['11111111111111111', '1', 'all ones: weights without position 9 add to 89, 89 mod 11 = 1 (hand-worked)'],
    ['1ZZAA11AXS1000000', 'X', 'sum 175 = 15 · 11 + 10, remainder 10 written X (hand-worked)'],
    ['1J9RP1A36A1644345', '6', "NHTSA's guide for new manufacturers, worked example, sum 314 [published]"],
  ])('%s has check digit %s (%s) and validates', (vin, digit) => {
    expect(vinCheckDigit(vin)).toBe(digit)
    expect(validateVin(vin)).toEqual({ valid: true, wellFormed: true, checkDigitOk: true, problems: [] })
  })

  it('accepts lower case and surrounding spaces, as typed at a counter', () => {
    expect(validateVin('  1g4ah59h45g118341 ').valid).toBe(true)
  })

  it('flags a wrong check digit but still calls the VIN well formed (check digit optional under ISO 3779)', () => {
    const result = validateVin('1G4AH59H55G118341')
    expect(result).toMatchObject({ valid: false, wellFormed: true, checkDigitOk: false })
    expect(result.problems.join(' ')).toMatch(/position 9/)
  })

  it.each([
    ['16 characters', '1G4AH59H45G11834', /17 characters/],
    ['18 characters', '1G4AH59H45G1183411', /17 characters/],
    ['a letter O', '1G4AH59H45G1O8341', /never contains O/],
    ['letters I and Q', '1G4AI59H45G1Q8341', /never contains I, Q/],
    ['a hyphen', '1G4AH59H4-G118341', /letters and digits/],
  ])('rejects a VIN with %s', (_label, vin, message) => {
    const result = validateVin(vin)
    expect(result).toMatchObject({ valid: false, wellFormed: false, checkDigitOk: false })
    expect(result.problems.join(' ')).toMatch(message)
    expect(() => vinCheckDigit(vin)).toThrow(RangeError)
  })

  const anyVin = fc
    .array(fc.constantFrom(...ALLOWED), { minLength: 17, maxLength: 17 })
    .map((chars) => chars.join(''))
    .map((body) => replaceAt(body, 8, vinCheckDigit(body)))

  it('agrees with the weighted sum written out here (weights 8 7 6 5 4 3 2 10 0 9 8 7 6 5 4 3 2)', () => {
    const weights = [8, 7, 6, 5, 4, 3, 2, 10, 0, 9, 8, 7, 6, 5, 4, 3, 2]
    fc.assert(
      fc.property(anyVin, (vin) => {
        const sum = [...vin].reduce((total, char, index) => total + valueOf(char) * (weights[index] ?? 0), 0)
        expect(vinCheckDigit(vin)).toBe(sum % 11 === 10 ? 'X' : String(sum % 11))
        expect(validateVin(vin).valid).toBe(true)
      }),
    )
  })

  it('catches any single mistyped character that changes its value', () => {
    fc.assert(
      fc.property(
        anyVin,
        fc.integer({ min: 0, max: 16 }).filter((i) => i !== 8),
        fc.constantFrom(...ALLOWED),
        (vin, index, char) => {
          fc.pre(valueOf(char) !== valueOf(vin.charAt(index)))
          expect(validateVin(replaceAt(vin, index, char)).checkDigitOk).toBe(false)
        },
      ),
    )
  })
})

describe(`vinModelYear (${YEAR_TABLE})`, () => {
  it.each([
    ['1G4AH59H45G118341', 2005],
    ['1ZZAA11AXS1000000', 1995],
    ['1J9RP1A36A1644345', 2010],
    ['11111111111111111', 2001],
  ])('%s is model year %i', (vin, year) => {
    expect(vinModelYear(vin)).toBe(year)
  })

  // Position 7 a digit selects 1980–2009, a letter 2010–2039 (light vehicles).
  it.each([
    ['1', 'A', 1980],
    ['1', 'Y', 2000],
    ['1', '1', 2001],
    ['1', '9', 2009],
    ['A', 'A', 2010],
    ['A', 'Y', 2030],
    ['A', '1', 2031],
    ['A', '9', 2039],
  ])('position 7 %s, position 10 %s is %i', (seventh, tenth, year) => {
    expect(vinModelYear(replaceAt(replaceAt('11111111111111111', 6, seventh), 9, tenth))).toBe(year)
  })

  it.each([['U'], ['Z'], ['0']])('has no year for code %s', (tenth) => {
    expect(vinModelYear(replaceAt('11111111111111111', 9, tenth))).toBeNull()
  })

  it('still reads the year when only the check digit is wrong', () => {
    expect(vinModelYear('1G4AH59H55G118341')).toBe(2005)
  })

  it('has no year for a malformed VIN', () => {
    expect(vinModelYear('1G4AH59H45G11834')).toBeNull()
  })

  it('gives 30 consecutive years in each cycle', () => {
    const codes = 'ABCDEFGHJKLMNPRSTVWXY123456789'
    const years = [...codes].map((code) => vinModelYear(replaceAt('11111111111111111', 9, code)))
    expect(years).toEqual(Array.from({ length: 30 }, (_, i) => 1980 + i))
  })
})
