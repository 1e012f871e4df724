import fc from 'fast-check'
import { unit } from 'mathjs'
import { describe, expect, it } from 'vitest'
import {
  bsfcToGPerKwh,
  ccPerMinToLbPerHour,
  DEFAULT_BSFC_LB_PER_HP_H,
  DEFAULT_MAX_DUTY,
  flowAtPressure,
  GASOLINE_DENSITY_G_PER_CC,
  injectorFlowNeededLbH,
  injectorHeadroom,
  lbPerHourToCcPerMin,
  supportedPowerHp,
} from '../../../shared/engineering/injectors'
import { hpToKw } from '../../../shared/engineering/units'

const TOLERANCE = 0.05

function within(actual: number, expected: number, tolerance = TOLERANCE): void {
  expect(Math.abs(actual - expected)).toBeLessThanOrEqual(tolerance)
}

describe('injector sizing (common practice formula)', () => {
  it('300 hp, BSFC 0.50, 6 injectors, duty 0.80 needs 31.25 lb/h per injector', () => {
    within(injectorFlowNeededLbH({ powerHp: 300, bsfc: 0.5, injectors: 6, maxDuty: 0.8 }), 31.25)
  })

  it('defaults to BSFC 0.5 and 80 % duty', () => {
    expect(DEFAULT_BSFC_LB_PER_HP_H).toBe(0.5)
    expect(DEFAULT_MAX_DUTY).toBe(0.8)
    within(injectorFlowNeededLbH({ powerHp: 300, injectors: 6 }), 31.25)
  })

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
  it('the familiar × 10.5 factor is 10.4998 at 0.720 g/cm³', () => {
    expect(GASOLINE_DENSITY_G_PER_CC).toBe(0.72)
    // Compared to the printed digits, tighter than the section tolerance so the factor itself is pinned.
    within(lbPerHourToCcPerMin(1), 10.4998, 0.00005)
  })

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

  it('BSFC 0.50 lb/hp·h is 304.14 g/kWh', () => {
    within(bsfcToGPerKwh(0.5), 304.14, 0.005)
    // mathjs as reference for the same conversion
    within(bsfcToGPerKwh(0.5), unit(0.5, 'lbm').toNumber('g') / unit(1, 'hp').toNumber('kW'), 0.001)
  })
})

// Orifice law, published in any fluid-mechanics text; test terms per SAE J1832 [published]
describe('flowAtPressure (orifice law [published])', () => {
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
    within(result.headroomPct, (508.07 / 328.12 - 1) * 100)
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

  it('passes a denser fuel through: fewer cc/min are needed for the same mass', () => {
    const base = { targetPowerKw: 200, injectors: 4, flowCcMin: 550, ratedPressureBar: 3, railPressureBar: 3 }
    const light = injectorHeadroom(base)
    const dense = injectorHeadroom({ ...base, densityGPerCc: 0.745 })
    within(dense.neededCcMin, (light.neededCcMin * 0.72) / 0.745, 1e-9)
  })
})
