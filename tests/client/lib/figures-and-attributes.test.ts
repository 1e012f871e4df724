import { describe, expect, it } from 'vitest'
import { attributeLabel, attributeRows } from '@/lib/attributes'
import { figureRows } from '@/lib/figures'
import { makeEvaluation } from '../../helpers/client-factories'

describe('figures with their units', () => {
  it('shows displacement in cc, compression as a ratio to 1 and injector headroom in percent', () => {
    const figures = {
      ...makeEvaluation().figures,
      displacementCc: 1795.5,
      sweptVolumeCc: 448.9,
      compressionRatio: 8.544,
      clearanceVolumeCc: 59.5,
      injectorHeadroomPct: 11.62,
      injectorNeededCcMin: 242,
      injectorAvailableCcMin: 270,
      headBoltProjectionMm: 26.6,
      threadEngagementMinMm: 16.5,
      headBoltMaxProjectionMm: 35,
    }
    const rows = Object.fromEntries(figureRows(figures).map((row) => [row.key, `${row.value} ${row.unit}`]))
    expect(rows).toEqual({
      displacement: '1,796 cc',
      compression: '8.54 : 1',
      'injector-headroom': '11.6 %',
      'bolt-projection': '26.6 mm',
    })
    expect(figureRows(figures).find((row) => row.key === 'injector-headroom')?.note).toBe('needs 242 cc/min, has 270 cc/min per injector')
  })

  it('leaves out figures the build cannot give yet instead of showing zero', () => {
    expect(figureRows(makeEvaluation().figures)).toEqual([])
  })
})

describe('attribute labels', () => {
  it.each([
    ['chamberCc', 'Chamber (cc)'],
    ['boltBossHeightMm', 'Bolt boss height (mm)'],
    ['flowCcMin', 'Flow (cc/min)'],
    ['ratedPressureBar', 'Rated pressure (bar)'],
    ['headBoltPattern', 'Head bolt pattern'],
    ['vvlLeads', 'Valve-lift leads'],
  ])('reads %s as %s', (name, label) => {
    expect(attributeLabel(name)).toBe(label)
  })

  it('writes yes or no for a boolean and numbers as they are', () => {
    expect(attributeRows({ oilRestrictor: false, boreMm: 86 }).map((row) => row.value)).toEqual(['No', '86'])
  })
})
