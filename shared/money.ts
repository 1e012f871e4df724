/** Money is integer cents of the shop's one currency; amounts are typed and filed as decimals without a sign. */
export const MAX_CENTS = 100_000_000

const DECIMAL = /^(\d{1,9})(?:\.(\d{1,2}))?$/

export type CentsReading = { ok: true; cents: number } | { ok: false; problem: 'negative' | 'not_an_amount' | 'too_large' }

/** A decimal amount ("125.50", "90") as whole cents, read digit by digit so no floating point rounds it. */
export function decimalToCents(text: string): CentsReading {
  const trimmed = text.trim()
  const match = DECIMAL.exec(trimmed)
  if (!match) return { ok: false, problem: /^-\s*\d/.test(trimmed) ? 'negative' : 'not_an_amount' }
  const cents = Number(match[1]) * 100 + Number((match[2] ?? '').padEnd(2, '0'))
  return cents > MAX_CENTS ? { ok: false, problem: 'too_large' } : { ok: true, cents }
}

/** Cents as the decimal a spreadsheet or a form field holds: 47950 as "479.50". */
export const centsToDecimal = (cents: number) => `${Math.floor(cents / 100)}.${String(cents % 100).padStart(2, '0')}`
