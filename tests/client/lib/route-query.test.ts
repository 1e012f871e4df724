import { describe, expect, it } from 'vitest'
import { queryInt, queryKind, queryKinds, queryNumber, queryOneOf, queryText } from '@/lib/route-query'

describe('route query readers', () => {
  it.each([
    ['a plain value, trimmed', '  TM-HD-2000 ', 'TM-HD-2000'],
    ['a repeated key (first one wins)', ['TM-BL-1800', 'TM-BL-2000'], 'TM-BL-1800'],
    ['a key without a value', null, ''],
    ['a repeated key starting without a value', [null, 'TM-BL-1800'], ''],
    ['a missing key', undefined, ''],
  ] as const)('reads text from %s', (_what, value, expected) => {
    expect(queryText(value as string | null | (string | null)[] | undefined)).toBe(expected)
  })

  it('accepts a part kind it knows and ignores any other word', () => {
    expect(queryKind('block')).toBe('block')
    expect(queryKind(' head ')).toBe('head')
    expect(queryKind('wheel')).toBeUndefined()
    expect(queryKind(undefined)).toBeUndefined()
  })

  it('accepts only the listed words', () => {
    const allowed = ['fits', 'unknown'] as const
    expect(queryOneOf('fits', allowed)).toBe('fits')
    expect(queryOneOf('Fits', allowed)).toBeUndefined()
  })

  it.each([
    ['2', 2],
    ['-3', -3],
    ['12abc', 12],
    ['two', undefined],
    ['', undefined],
  ] as const)('reads the whole number %j as %j', (value, expected) => {
    expect(queryInt(value)).toBe(expected)
  })

  it.each([
    ['110.5', 110.5],
    ['12abc', undefined],
    ['Infinity', undefined],
    ['  ', undefined],
  ] as const)('reads the number %j as %j', (value, expected) => {
    expect(queryNumber(value)).toBe(expected)
  })

  it('reads a list of kinds in catalogue order, dropping unknown and repeated ones', () => {
    expect(queryKinds('head-gasket,block,nonsense,block')).toEqual(['block', 'head-gasket'])
    expect(queryKinds(undefined)).toEqual([])
    expect(queryKinds(['head', 'block'])).toEqual(['head'])
  })
})
