import { describe, expect, it } from 'vitest'
import { centsToDecimal, decimalToCents } from '../../shared/money'

describe('decimalToCents', () => {
  // Worked by hand: whole units times 100 plus the cents as written; 0.1 + 0.2 style float error must not creep in.
  it.each([
    ['125.50', 12550],
    ['90', 9000],
    ['0.3', 30],
    ['0.07', 7],
    ['1000000.00', 100_000_000],
    [' 19.99 ', 1999],
  ])('reads %j as %i cents', (text, cents) => {
    expect(decimalToCents(text)).toEqual({ ok: true, cents })
  })

  it.each([
    ['-5.00', 'negative'],
    ['- 5', 'negative'],
    ['about ten', 'not_an_amount'],
    ['12,50', 'not_an_amount'],
    ['1.234', 'not_an_amount'],
    ['$10', 'not_an_amount'],
    ['', 'not_an_amount'],
    ['1000000.01', 'too_large'],
  ])('refuses %j as %s', (text, problem) => {
    expect(decimalToCents(text)).toEqual({ ok: false, problem })
  })
})

describe('centsToDecimal', () => {
  it.each([
    [47950, '479.50'],
    [7, '0.07'],
    [0, '0.00'],
    [9000, '90.00'],
  ])('writes %i cents as %j', (cents, text) => {
    expect(centsToDecimal(cents)).toBe(text)
  })
})
