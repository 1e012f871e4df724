import { createPinia, setActivePinia } from 'pinia'
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest'
import type { BuildSheet } from '@shared/schemas/build'
import { ApiError } from '@/api/http'
import { plannerToQuery } from '@/lib/planner-query'
import { sheetState, usePlannerStore } from '@/stores/planner'
import { makeEvaluation, makePart } from '../../helpers/client-factories'

function sheet(overrides: Partial<BuildSheet> = {}): BuildSheet {
  return {
    id: 7,
    name: 'ZX head on ZY block',
    slots: { block: 'ZY-BL-1', head: 'ZX-HD-2' },
    targetPowerKw: 110,
    fuelOctane: null,
    chassisModelYear: null,
    vin: null,
    vehicleId: null,
    faceFinish: null,
    notes: '',
    checklist: {},
    verdict: null,
    labourMinutes: null,
    owner: { id: 1, name: 'A. Tech' },
    createdAt: '2026-01-01T00:00:00.000Z',
    updatedAt: '2026-01-01T00:00:00.000Z',
    ...overrides,
  }
}

/** The network edge: every evaluation answers `answer`; the bodies sent are kept. */
function stubEvaluate(answer = makeEvaluation()) {
  const bodies: unknown[] = []
  vi.stubGlobal('fetch', async (_url: string, init: RequestInit) => {
    bodies.push(JSON.parse(String(init.body)))
    return new Response(JSON.stringify(answer), { status: 200, headers: { 'Content-Type': 'application/json' } })
  })
  return bodies
}

describe('planner store', () => {
  beforeEach(() => setActivePinia(createPinia()))
  afterEach(() => vi.unstubAllGlobals())

  it("gives a saved sheet's build as the address holds it, leaving out empty context", () => {
    expect(plannerToQuery(sheetState(sheet()))).toEqual({ block: 'ZY-BL-1', head: 'ZX-HD-2', power: '110' })
  })

  it("opens a sheet's deck and head face readings into the address and saves them back as one field", () => {
    const state = sheetState(sheet({ faceFinish: { deckRaUm: 2.4, headFlatnessMm: 0.08 } }))
    expect(plannerToQuery(state)).toMatchObject({ deckRa: '2.4', headFlat: '0.08' })
    expect(usePlannerStore().sheetUpdate(state).faceFinish).toEqual({ deckRaUm: 2.4, headFlatnessMm: 0.08 })
    expect(usePlannerStore().sheetUpdate(sheetState(sheet())).faceFinish).toBeNull()
  })

  it('saves every context field, clearing with null what the build no longer has', () => {
    const planner = usePlannerStore()
    const state = { slots: { block: 'ZY-BL-1', head: 'ZX-HD-2' }, context: { targetPowerKw: 110 } }
    expect(planner.sheetUpdate(state)).toEqual({
      slots: { block: 'ZY-BL-1', head: 'ZX-HD-2' },
      targetPowerKw: 110,
      fuelOctane: null,
      chassisModelYear: null,
      vin: null,
      vehicleId: null,
      faceFinish: null,
      checklist: {},
    })
    expect(planner.sheetInput(state, 'Copy', 'n')).toEqual({
      slots: { block: 'ZY-BL-1', head: 'ZX-HD-2' },
      targetPowerKw: 110,
      name: 'Copy',
      notes: 'n',
      checklist: {},
    })
  })

  it("puts the server's field messages next to the slot or field they name", () => {
    const planner = usePlannerStore()
    planner.evaluationError = new ApiError(400, 'bad_request', 'Bad build', [
      { path: 'slots.head', message: 'ZY-BL-1 is a cylinder block, not a cylinder head.' },
      { path: 'fuelOctane', message: 'Octane (AKI) below 70 is not pump fuel.' },
    ])
    expect(planner.fieldErrors).toEqual({
      head: 'ZY-BL-1 is a cylinder block, not a cylinder head.',
      fuelOctane: 'Octane (AKI) below 70 is not pump fuel.',
    })
  })

  it('asks the server nothing and shows no verdict while no slot is filled', async () => {
    const bodies = stubEvaluate()
    const planner = usePlannerStore()
    await planner.evaluate({ slots: {}, context: { targetPowerKw: 100 } })
    expect(bodies).toEqual([])
    expect(planner.result).toBeNull()
  })

  it('checks a build once, however often it is asked, and again when the build changes', async () => {
    const bodies = stubEvaluate()
    const planner = usePlannerStore()
    await planner.evaluate({ slots: { block: 'ZY-BL-1' }, context: {} })
    await planner.evaluate({ slots: { block: 'ZY-BL-1' }, context: {} })
    await planner.evaluate({ slots: { block: 'ZY-BL-1', head: 'ZX-HD-2' }, context: {} })
    expect(bodies).toEqual([{ slots: { block: 'ZY-BL-1' } }, { slots: { block: 'ZY-BL-1', head: 'ZX-HD-2' } }])
  })

  it('gives the current number of a slot typed as a mark, and does not check that same build again', async () => {
    const bodies = stubEvaluate(makeEvaluation({ parts: { head: makePart('ZX-HD-2', 'head') } }))
    const planner = usePlannerStore()
    const current = await planner.evaluate({ slots: { head: '2HX' }, context: {} })
    expect(current).toEqual({ head: 'ZX-HD-2' })
    planner.markEvaluated({ slots: { head: 'ZX-HD-2' }, context: {} })
    await planner.evaluate({ slots: { head: 'ZX-HD-2' }, context: {} })
    expect(bodies).toHaveLength(1)
  })
})

describe('checklist ticks', () => {
  beforeEach(() => setActivePinia(createPinia()))

  it('sends the ticks with a sheet update and keeps them in step order', () => {
    const planner = usePlannerStore()
    planner.openSheet(sheet({ checklist: { 'oil-restrictor-fit': [0] } }))
    planner.setTick('oil-restrictor-fit', 3, true)
    planner.setTick('oil-restrictor-fit', 1, true)
    planner.setTick('oil-restrictor-fit', 0, false)
    expect(planner.sheetUpdate(sheetState(sheet())).checklist).toEqual({ 'oil-restrictor-fit': [1, 3] })
  })

  it('forgets the ticks when the sheet is forgotten', () => {
    const planner = usePlannerStore()
    planner.openSheet(sheet({ checklist: { 'oil-restrictor-fit': [2] } }))
    planner.forget()
    expect(planner.isTicked('oil-restrictor-fit', 2)).toBe(false)
    expect(planner.ticksChanged).toBe(false)
  })
})
