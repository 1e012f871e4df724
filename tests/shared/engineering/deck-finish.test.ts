import { unit } from 'mathjs'
import { describe, expect, it } from 'vitest'
import { checkDeckFinish, DECK_FINISH_LIMITS, type DeckFinishInput } from '../../../shared/engineering/deck-finish'

// That multi-layer steel needs a smoother, flatter face than composite is common practice; the
// limits (MLS 30 µin Ra and 0.002 in, composite 125 µin Ra and 0.004 in) are the trade's usual
// figures from memory, not a published table. Inch-to-metric conversions are checked with mathjs.
const MLS = DECK_FINISH_LIMITS['multi-layer-steel']
const COMPOSITE = DECK_FINISH_LIMITS.composite
const microinch = (value: number): number => unit(value * 1e-6, 'inch').toNumber('micrometer')
const thou = (value: number): number => unit(value / 1000, 'inch').toNumber('mm')

function face(change: Partial<DeckFinishInput> = {}): DeckFinishInput {
  return { construction: 'composite', raUm: 1.6, flatnessMm: 0.03, ...change }
}

describe('deck finish limits by gasket construction (common practice, figures from memory)', () => {
  it('asks a smoother and flatter face of multi-layer steel than of composite', () => {
    expect(MLS.maxRaUm).toBeLessThan(COMPOSITE.maxRaUm)
    expect(MLS.maxFlatnessMm).toBeLessThan(COMPOSITE.maxFlatnessMm)
  })

  it.each([
    ['MLS Ra 30 µin = 0.762 µm', MLS.maxRaUm, microinch(30), 1e-9],
    ['composite Ra 125 µin = 3.175 µm', COMPOSITE.maxRaUm, microinch(125), 1e-9],
    // 0.002 in = 0.0508 mm and 0.004 in = 0.1016 mm, rounded to 0.05 and 0.10 mm
    ['MLS flatness 0.002 in', MLS.maxFlatnessMm, thou(2), 0.001],
    ['composite flatness 0.004 in', COMPOSITE.maxFlatnessMm, thou(4), 0.002],
  ])('%s', (_label, limit, inchFigure, tolerance) => {
    expect(Math.abs(limit - inchFigure)).toBeLessThanOrEqual(tolerance)
  })

  it('names its source honestly', () => {
    expect(MLS.source).toMatch(/from memory/)
    expect(COMPOSITE.source).toMatch(/from memory/)
  })
})

describe('checkDeckFinish', () => {
  // Ra 1.6 µm (63 µin) is rougher than MLS's 0.762 µm, within composite's 3.175 µm
  it('passes a 1.6 µm Ra face under a composite gasket and sends it for resurfacing under MLS', () => {
    expect(checkDeckFinish(face())).toMatchObject({ status: 'ok', problems: [] })
    const mls = checkDeckFinish(face({ construction: 'multi-layer-steel' }))
    expect(mls.status).toBe('resurface')
    expect(mls.problems.map((p) => p.kind)).toEqual(['too-rough'])
    expect(mls.problems[0]?.text).toMatch(/multi-layer steel.*resurface/)
  })

  it('judges flatness by construction: 0.08 mm is fine under composite, out of flat under MLS', () => {
    expect(checkDeckFinish(face({ flatnessMm: 0.08 })).status).toBe('ok')
    const mls = checkDeckFinish(face({ construction: 'multi-layer-steel', raUm: 0.5, flatnessMm: 0.08 }))
    expect(mls.problems.map((p) => p.kind)).toEqual(['out-of-flat'])
  })

  it('accepts a face exactly on the limits', () => {
    expect(checkDeckFinish(face({ construction: 'multi-layer-steel', raUm: microinch(30), flatnessMm: 0.05 })).status).toBe('ok')
  })

  it('lists both problems when a face is rough and warped', () => {
    const check = checkDeckFinish(face({ raUm: 4, flatnessMm: 0.2 }))
    expect(check.problems.map((p) => p.kind)).toEqual(['too-rough', 'out-of-flat'])
  })

  it('lets the service manual govern: 0.04 mm fails a 0.03 mm manual limit even under composite', () => {
    const check = checkDeckFinish(face({ flatnessMm: 0.04, serviceManual: { maxFlatnessMm: 0.03 } }))
    expect(check.status).toBe('resurface')
    expect(check.limits).toMatchObject({ maxFlatnessMm: 0.03, maxRaUm: COMPOSITE.maxRaUm, source: 'service manual' })
  })

  it.each([
    ['raUm', { raUm: -1 }],
    ['flatnessMm', { flatnessMm: Number.NaN }],
    ['serviceManual.maxRaUm', { serviceManual: { maxRaUm: 0 } }],
  ])('rejects a bad %s with a RangeError naming it', (name, change) => {
    expect(() => checkDeckFinish(face(change))).toThrow(name)
  })
})
