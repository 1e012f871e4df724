import { describe, expect, it } from 'vitest'
import { lineCents, quoteTotals } from '../../shared/quote-totals'

// Hand-worked examples; the arithmetic is written out beside each so the expected value never comes from the code.
describe('quote arithmetic in cents', () => {
  it.each([
    [{ kind: 'part' as const, quantity: 4, unitPriceCents: 1999 }, 7996, '4 × 19.99 = 79.96'],
    [{ kind: 'labour' as const, quantity: 1.5, unitPriceCents: 8450 }, 12675, '1.5 h × 84.50 = 126.75'],
    [{ kind: 'labour' as const, quantity: 0.25, unitPriceCents: 8450 }, 2113, '0.25 h × 84.50 = 21.125, half up to 21.13'],
    [{ kind: 'labour' as const, quantity: 1 / 3, minutes: 20, unitPriceCents: 9000 }, 3000, '20 min at 90.00 an hour = 30.00'],
    [{ kind: 'labour' as const, quantity: 7 / 60, minutes: 7, unitPriceCents: 8450 }, 986, '7 min at 84.50 an hour = 9.8583, to 9.86'],
  ])('prices %j as %i cents (%s)', (line: Parameters<typeof lineCents>[0], cents: number, _working: string) => {
    expect(lineCents(line)).toBe(cents)
  })

  it('adds parts, labour and cores, then tax once on the sum, rounded half up', () => {
    // Parts 489.00 + 3 × 12.50 = 526.50; labour 2.5 h × 84.50 = 211.25; core 60.00.
    // Taxable 797.75; 20 % of it is 159.55; total 957.30.
    const totals = quoteTotals(
      [
        { kind: 'part', quantity: 1, unitPriceCents: 48900 },
        { kind: 'consumable', quantity: 3, unitPriceCents: 1250 },
        { kind: 'labour', quantity: 2.5, unitPriceCents: 8450 },
        { kind: 'core', quantity: 1, unitPriceCents: 6000 },
      ],
      2000,
    )
    expect(totals).toEqual({ partsCents: 52650, labourCents: 21125, coreCents: 6000, taxCents: 15955, totalCents: 95730 })
  })

  it('rounds a tax of exactly half a cent up: 8.25 % of 10.10 is 0.83325, and of 0.06 is 0.00495', () => {
    expect(quoteTotals([{ kind: 'part', quantity: 1, unitPriceCents: 1010 }], 825).taxCents).toBe(83)
    expect(quoteTotals([{ kind: 'part', quantity: 1, unitPriceCents: 6 }], 825).taxCents).toBe(0)
    // 10 % of 0.05 is 0.005: half a cent, rounded up to 0.01.
    expect(quoteTotals([{ kind: 'part', quantity: 1, unitPriceCents: 5 }], 1000).taxCents).toBe(1)
  })
})
