import { describe, expect, it } from 'vitest'
import { editDistance } from '../../shared/edit-distance'

describe('editDistance', () => {
  // Textbook Levenshtein values (Levenshtein 1966; the worked examples of the usual
  // dynamic-programming presentation, e.g. Jurafsky & Martin ch. 2 with unit substitution cost).
  it.each([
    ['kitten', 'sitting', 3],
    ['saturday', 'sunday', 3],
    ['flaw', 'lawn', 2],
    ['intention', 'execution', 5],
    ['', 'abc', 3],
    ['abc', '', 3],
    ['same', 'same', 0],
    ['ab', 'ba', 2],
  ])('between %s and %s is %i', (a, b, expected) => {
    expect(editDistance(a, b)).toBe(expected)
    expect(editDistance(b, a)).toBe(expected)
  })

  it('with a bound, answers the true distance up to the bound and bound + 1 beyond it', () => {
    expect(editDistance('kitten', 'sitting', 3)).toBe(3)
    expect(editDistance('kitten', 'sitting', 2)).toBe(3)
    expect(editDistance('intention', 'execution', 2)).toBe(3)
    expect(editDistance('TMBL2000', 'TMBL2000HC', 1)).toBe(2)
    expect(editDistance('TMBL2000', 'TMBL2001', 2)).toBe(1)
  })
})
