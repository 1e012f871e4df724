import { describe, expect, it } from 'vitest'
import {
  buildKey,
  evaluateBody,
  isEmptyBuild,
  plannerFromQuery,
  plannerToQuery,
  sameBuild,
  withContext,
  withSlots,
} from '@/lib/planner-query'

describe('planner address', () => {
  it('keeps the deck and head face readings in the address, as the sheet saves them', () => {
    const query = { block: 'ZX-BL-1', deckRa: '2.4', deckFlat: '0.03', headFlat: '0.08' }
    const state = plannerFromQuery(query)
    expect(state.context).toEqual({ deckRaUm: 2.4, deckFlatnessMm: 0.03, headFlatnessMm: 0.08 })
    expect(plannerToQuery(state)).toEqual(query)
    expect(evaluateBody(state)).toMatchObject({ deckRaUm: 2.4, deckFlatnessMm: 0.03, headFlatnessMm: 0.08 })
  })

  it('reads slots and context from the query and writes the same query back', () => {
    const query = { block: 'ZX-BL-1', head: 'ZX-HD-2', power: '110', octane: '91', year: '1994', vin: 'ABC123' }
    const state = plannerFromQuery(query)
    expect(state).toEqual({
      slots: { block: 'ZX-BL-1', head: 'ZX-HD-2' },
      context: { targetPowerKw: 110, fuelOctane: 91, chassisModelYear: 1994, vin: 'ABC123' },
    })
    expect(plannerToQuery(state)).toEqual(query)
  })

  it('keeps the vehicle application it was planned from in the address, for the quote', () => {
    const query = { block: 'ZX-BL-1', year: '1993', vehicle: '4' }
    const state = plannerFromQuery(query)
    expect(state.context).toEqual({ chassisModelYear: 1993, vehicleId: 4 })
    expect(plannerToQuery(state)).toEqual(query)
    expect(evaluateBody(state)).toMatchObject({ vehicleId: 4 })
  })

  it('writes slots in template order whatever order they were chosen in, so a build has one address', () => {
    const query = plannerToQuery({ slots: { injector: 'ZX-IN-1', head: 'ZX-HD-2', block: 'ZX-BL-1' }, context: {} })
    expect(Object.keys(query)).toEqual(['block', 'head', 'injector'])
  })

  it.each([
    ['an unknown slot name', { wheel: 'ZX-1', head: 'ZX-HD-2' }, { slots: { head: 'ZX-HD-2' }, context: {} }],
    ['a power that is not a number', { power: 'lots' }, { slots: {}, context: {} }],
    ['blank values', { head: '  ', vin: '' }, { slots: {}, context: {} }],
    ['a repeated key (first one wins)', { head: ['ZX-HD-2', 'ZX-HD-3'] }, { slots: { head: 'ZX-HD-2' }, context: {} }],
    ['a vehicle id that is not a whole positive number', { vehicle: '2.5' }, { slots: {}, context: {} }],
    ['a negative vehicle id', { vehicle: '-3' }, { slots: {}, context: {} }],
  ])('ignores %s', (_what, query, expected) => {
    expect(plannerFromQuery(query)).toEqual(expected)
  })

  it('treats two queries that differ only in key order or foreign keys as the same build', () => {
    const now = plannerToQuery({ slots: { block: 'ZX-BL-1', head: 'ZX-HD-2' }, context: { targetPowerKw: 90 } })
    expect(sameBuild({ power: '90', head: 'ZX-HD-2', block: 'ZX-BL-1', utm: 'x' }, now)).toBe(true)
    expect(sameBuild({ head: 'ZX-HD-2', block: 'ZX-BL-1' }, now)).toBe(false)
  })

  it('says an address without slots or context holds no build', () => {
    expect(isEmptyBuild({ sheet: '2' })).toBe(true)
    expect(isEmptyBuild({ octane: '95' })).toBe(false)
  })

  it('sends only filled slots to the evaluation, with the context beside them', () => {
    expect(evaluateBody({ slots: { block: 'ZX-BL-1', head: '' }, context: { fuelOctane: 95 } })).toEqual({
      slots: { block: 'ZX-BL-1' },
      fuelOctane: 95,
    })
  })
})

describe('changing a build', () => {
  it('sets a slot trimmed, replaces it, and clears it for an empty value, leaving the others', () => {
    const start = { slots: { block: 'ZX-BL-1', head: 'ZX-HD-2' }, context: { targetPowerKw: 90 } }
    expect(withSlots(start, { head: ' ZX-HD-3 ', 'head-gasket': 'ZX-HG-1' }).slots).toEqual({
      block: 'ZX-BL-1',
      head: 'ZX-HD-3',
      'head-gasket': 'ZX-HG-1',
    })
    expect(withSlots(start, { head: null, block: '  ' }).slots).toEqual({})
    expect(start.slots).toEqual({ block: 'ZX-BL-1', head: 'ZX-HD-2' })
  })

  it('drops a context value that is cleared and keeps the rest', () => {
    const start = { slots: {}, context: { targetPowerKw: 90, fuelOctane: 91 } }
    expect(withContext(start, { targetPowerKw: undefined }).context).toEqual({ fuelOctane: 91 })
    expect(withContext(start, { vin: '' }).context).toEqual({ targetPowerKw: 90, fuelOctane: 91 })
  })

  it('gives one key to the same build whatever order its address was written in', () => {
    expect(buildKey(plannerFromQuery({ head: 'ZX-HD-2', block: 'ZX-BL-1' }))).toBe(
      buildKey(plannerFromQuery({ block: 'ZX-BL-1', head: 'ZX-HD-2' })),
    )
  })
})
