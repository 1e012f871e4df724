import fc from 'fast-check'
import { unit } from 'mathjs'
import { describe, expect, it } from 'vitest'
import {
  bsfcToGPerKwh,
  ccPerMinToLbPerHour,
  flowAtPressure,
  injectorFlowNeededLbH,
  injectorHeadroom,
  lbPerHourToCcPerMin,
  supportedPowerHp,
} from '../../../shared/engineering/injectors'
import { hpToKw } from '../../../shared/engineering/units'

// The sizing formula and its defaults (BSFC 0.50 lb/hp·h, 80 % duty, 0.72 g/cm³) are common practice
// every check value is hand-worked in the comment beside it.
const TOLERANCE = 0.05

function within(actual: number, expected: number, tolerance = TOLERANCE): void {
  expect(Math.abs(actual - expected)).toBeLessThanOrEqual(tolerance)
}

describe('injector sizing (common practice formula)', () => {
  // 300 · 0.50 / (6 · 0.80) = 150 / 4.8 = 31.25 lb/h
  it('300 hp, BSFC 0.50, 6 injectors, duty 0.80 needs 31.25 lb/h per injector', () => {
    within(injectorFlowNeededLbH({ powerHp: 300, bsfc: 0.5, injectors: 6, maxDuty: 0.8 }), 31.25)
  })

  it('defaults to BSFC 0.5 and 80 % duty (common practice): 300 hp on 6 injectors is again 31.25 lb/h', () => {
    within(injectorFlowNeededLbH({ powerHp: 300, injectors: 6 }), 31.25)
  })

  // 440 cc/min · 0.72 g/cm³ · 60 min/h = 19,008 g/h / 453.59237 g/lb = 41.905 lb/h;
  // 41.905 · 6 · 0.8 / 0.5 = 402.3 hp
  it('six 440 cc/min injectors (41.905 lb/h) at duty 0.8, BSFC 0.5 support 402.3 hp', () => {
    const flowLbH = ccPerMinToLbPerHour(440)
    within(flowLbH, 41.905, 0.001)
    within(supportedPowerHp({ flowLbH, injectors: 6, bsfc: 0.5, maxDuty: 0.8 }), 402.3)
  })

  it('supportedPowerHp inverts injectorFlowNeededLbH', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 10, max: 2000, noNaN: true }),
        fc.integer({ min: 1, max: 16 }),
        fc.double({ min: 0.35, max: 0.8, noNaN: true }),
        fc.double({ min: 0.5, max: 1, noNaN: true }),
        (powerHp, injectors, bsfc, maxDuty) => {
          const flowLbH = injectorFlowNeededLbH({ powerHp, injectors, bsfc, maxDuty })
          within(supportedPowerHp({ flowLbH, injectors, bsfc, maxDuty }), powerHp, 1e-9 * powerHp)
        },
      ),
    )
  })

  it.each([
    ['injectors', { powerHp: 300, injectors: 0 }],
    ['injectors', { powerHp: 300, injectors: 4.5 }],
    ['maxDuty', { powerHp: 300, injectors: 6, maxDuty: 1.2 }],
    ['bsfc', { powerHp: 300, injectors: 6, bsfc: 0 }],
    ['powerHp', { powerHp: -1, injectors: 6 }],
  ])('rejects a bad %s', (name, input) => {
    expect(() => injectorFlowNeededLbH(input)).toThrow(name)
  })
})

describe('mass flow to volume flow (common practice)', () => {
  // The trade's shortcut "lb/h × 10.5 = cc/min" (common practice) is 453.59237 / (60 · 0.72) = 10.49982
  // by hand, so the default density is the one behind it; the tolerance is tighter than the section's.
  it("the default density reproduces the trade's × 10.5 shortcut: 1 lb/h is 10.4998 cc/min", () => {
    within(lbPerHourToCcPerMin(1), 10.4998, 0.00005)
  })

  // 31.25 · 453.59237 / (60 · 0.72) = 14,174.76 / 43.2 = 328.12;  / (60 · 0.745) = 14,174.76 / 44.7 = 317.11
  it.each([
    [31.25, 0.72, 328.12],
    [31.25, 0.745, 317.11],
  ])('%f lb/h at %f g/cm³ is %f cc/min', (lbh, density, ccMin) => {
    within(lbPerHourToCcPerMin(lbh, density), ccMin)
  })

  it('matches mathjs as reference (lbm/h to g/min over density)', () => {
    fc.assert(
      fc.property(fc.double({ min: 1, max: 500, noNaN: true }), fc.double({ min: 0.65, max: 0.8, noNaN: true }), (lbh, density) => {
        const reference = unit(lbh, 'lbm/hour').toNumber('g/minute') / density
        within(lbPerHourToCcPerMin(lbh, density), reference, 1e-9 * reference)
      }),
    )
  })

  it('round-trips between lb/h and cc/min', () => {
    fc.assert(
      fc.property(fc.double({ min: 0, max: 5000, noNaN: true }), fc.double({ min: 0.65, max: 0.8, noNaN: true }), (ccMin, density) => {
        within(lbPerHourToCcPerMin(ccPerMinToLbPerHour(ccMin, density), density), ccMin, 1e-9)
      }),
    )
  })

  // 0.5 · 453.59237 g / 0.7456999 kW = 226.796 / 0.7457 = 304.14 g/kWh
  it('BSFC 0.50 lb/hp·h is 304.14 g/kWh', () => {
    within(bsfcToGPerKwh(0.5), 304.14, 0.005)
    // mathjs as reference for the same conversion
    within(bsfcToGPerKwh(0.5), unit(0.5, 'lbm').toNumber('g') / unit(1, 'hp').toNumber('kW'), 0.001)
  })
})

// Orifice law Q ∝ √ΔP [published in any fluid-mechanics text]; test terms per SAE J1832 [published]
describe('flowAtPressure (orifice law [published])', () => {
  // 440 · √(4/3) = 440 · 1.154701 = 508.07 cc/min
  it('440 cc/min rated at 3.0 bar flows 508.07 cc/min at 4.0 bar', () => {
    within(flowAtPressure(440, 3.0, 4.0), 508.07)
  })

  it('round-trips: back to the rated pressure gives the rated flow', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 50, max: 2500, noNaN: true }),
        fc.double({ min: 1, max: 10, noNaN: true }),
        fc.double({ min: 1, max: 10, noNaN: true }),
        (flow, rated, rail) => {
          within(flowAtPressure(flowAtPressure(flow, rated, rail), rail, rated), flow, 1e-9 * flow)
        },
      ),
    )
  })

  it('quadrupling the pressure doubles the flow', () => {
    fc.assert(
      fc.property(fc.double({ min: 50, max: 2500, noNaN: true }), fc.double({ min: 1, max: 10, noNaN: true }), (flow, rated) => {
        within(flowAtPressure(flow, rated, 4 * rated), 2 * flow, 1e-9 * flow)
      }),
    )
  })

  it('rejects a zero rated pressure', () => {
    expect(() => flowAtPressure(440, 0, 4)).toThrow(RangeError)
  })
})

describe('injectorHeadroom (common practice formula with the orifice law)', () => {
  it('300 hp on six 440 cc/min injectors rated at 3 bar, run at 4 bar: 328.12 needed, 508.07 available', () => {
    const result = injectorHeadroom({
      targetPowerKw: hpToKw(300),
      injectors: 6,
      flowCcMin: 440,
      ratedPressureBar: 3,
      railPressureBar: 4,
    })
    within(result.neededCcMin, 328.12)
    within(result.availableCcMin, 508.07)
    // 508.07 / 328.12 = 1.5484: 54.84 % to spare
    within(result.headroomPct, 54.84)
  })

  it('is negative exactly when the injectors flow less than the target needs', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 20, max: 800, noNaN: true }),
        fc.integer({ min: 2, max: 12 }),
        fc.double({ min: 100, max: 2000, noNaN: true }),
        fc.double({ min: 2.5, max: 6, noNaN: true }),
        (targetPowerKw, injectors, flowCcMin, railPressureBar) => {
          const result = injectorHeadroom({ targetPowerKw, injectors, flowCcMin, ratedPressureBar: 3, railPressureBar })
          expect(result.headroomPct < 0).toBe(result.availableCcMin < result.neededCcMin)
        },
      ),
    )
  })

  // 200 kW / 0.7456999 = 268.204 hp; · 0.5 / (4 · 0.8) = 41.907 lb/h;
  // · 453.59237 / (60 · 0.72) = 440.02 cc/min, / (60 · 0.745) = 425.25 cc/min
  it('passes a denser fuel through: fewer cc/min are needed for the same mass', () => {
    const base = { targetPowerKw: 200, injectors: 4, flowCcMin: 550, ratedPressureBar: 3, railPressureBar: 3 }
    within(injectorHeadroom(base).neededCcMin, 440.02)
    within(injectorHeadroom({ ...base, densityGPerCc: 0.745 }).neededCcMin, 425.25)
  })
})
