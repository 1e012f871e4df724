import { describe, expect, it } from 'vitest'
import { parsePartRow } from '../../server/imports/csv/part-row'

const row = (values: Record<string, string>) => ({ part_number: 'X-1', kind: 'head', name: 'A head', ...values })

describe('parsePartRow', () => {
  it('types known attributes from snake_case columns and keeps unknown columns as text', () => {
    const result = parsePartRow(row({ chamber_cc: '44.5', oil_restrictor: 'yes', valve_lift: 'variable', finish: '12' }))
    expect(result).toMatchObject({
      ok: true,
      part: { attributes: { chamberCc: 44.5, oilRestrictor: true, valveLift: 'variable', finish: '12' } },
    })
  })

  it('reads marks from the reserved list columns', () => {
    const result = parsePartRow(row({ casting_marks: 'H1; H1B', superseded_numbers: 'OLD-1' }))
    expect(result.ok && result.part.marks).toEqual([
      { type: 'casting', value: 'H1' },
      { type: 'casting', value: 'H1B' },
      { type: 'superseded', value: 'OLD-1' },
    ])
  })

  it.each([
    [{ chamber_cc: 'big' }, 'chamber_cc', 'not a number'],
    [{ oil_restrictor: 'perhaps' }, 'oil_restrictor', 'not true or false'],
    [{ kind: 'flux' }, 'kind', 'Unknown kind'],
    [{ year_from: '1999', year_to: '1990' }, 'year_from', 'after'],
    [{ year_from: '99' }, 'year_from', 'four-digit'],
    [{ valve_lift: 'sometimes' }, 'valve_lift', ''],
    [{ name: '' }, 'name', 'required'],
  ])('reports %j at column %s', (values, column, message) => {
    const result = parsePartRow(row(values))
    expect(result.ok).toBe(false)
    if (!result.ok) {
      const error = result.errors.find((e) => e.column === column)
      expect(error, JSON.stringify(result.errors)).toBeDefined()
      expect(error!.message).toContain(message)
    }
  })

  it('reports every problem of a row when the name is empty and a year is bad', () => {
    const result = parsePartRow(row({ name: '', year_from: '99' }))
    expect(result.ok).toBe(false)
    if (!result.ok) expect(result.errors.map((e) => e.column).sort()).toEqual(['name', 'year_from'])
  })

  it('still checks the name and years of a row whose kind is unknown', () => {
    const result = parsePartRow(row({ kind: 'flux', name: '', year_to: 'soon' }))
    expect(result.ok).toBe(false)
    if (!result.ok) expect(result.errors.map((e) => e.column).sort()).toEqual(['kind', 'name', 'year_to'])
  })
})
