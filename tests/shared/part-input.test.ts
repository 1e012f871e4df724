import { describe, expect, it } from 'vitest'
import { partInputSchema } from '../../shared/schemas/part-input'
import { normalisePartCode } from '../../shared/schemas/part'
import { parseMetricThread } from '../../shared/schemas/part-attributes'

describe('partInputSchema', () => {
  const base = { partNumber: 'X-1', kind: 'block', name: 'A block' }

  it('accepts a part with typed attributes of its kind and keeps unknown attributes as text', () => {
    const parsed = partInputSchema.parse({ ...base, attributes: { boreMm: 86, oilRestrictor: true, paintCode: 'grey' } })
    expect(parsed.attributes).toEqual({ boreMm: 86, oilRestrictor: true, paintCode: 'grey' })
    expect(parsed.family).toBe('')
  })

  it.each([
    [{ attributes: { boreMm: 'wide' } }, 'attributes.boreMm'],
    [{ attributes: { boreMm: -3 } }, 'attributes.boreMm'],
    [{ attributes: { headBoltThread: '11mm' } }, 'attributes.headBoltThread'],
    [{ kind: 'widget' }, 'kind'],
    [{ yearFrom: 1999, yearTo: 1990 }, 'yearFrom'],
    [{ partNumber: '  ' }, 'partNumber'],
  ])('rejects %j at %s', (change, path) => {
    const result = partInputSchema.safeParse({ ...base, ...change })
    expect(result.success).toBe(false)
    expect(result.error?.issues.map((issue) => issue.path.join('.'))).toContain(path)
  })
})

describe('normalisePartCode', () => {
  it.each([
    ['tm-hd-2000', 'TMHD2000'],
    [' TM HD 2000 ', 'TMHD2000'],
    ['c20/5521.b', 'C205521B'],
  ])('reads %s as %s', (input, expected) => {
    expect(normalisePartCode(input)).toBe(expected)
  })
})

describe('parseMetricThread', () => {
  it('reads diameter and pitch from ISO metric notation (ISO 965-1 designation)', () => {
    expect(parseMetricThread('M11x1.5')).toEqual({ diameterMm: 11, pitchMm: 1.5 })
    expect(parseMetricThread('M10x1.25')).toEqual({ diameterMm: 10, pitchMm: 1.25 })
    expect(parseMetricThread('11x1.5')).toBeNull()
  })
})
