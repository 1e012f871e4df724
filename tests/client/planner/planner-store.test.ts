import { createPinia, setActivePinia } from 'pinia'
import { beforeEach, describe, expect, it, vi } from 'vitest'
import type { BuildSheet } from '@shared/schemas/build'
import { ApiError } from '@/api/http'
import { usePlannerStore } from '@/stores/planner'

function sheet(overrides: Partial<BuildSheet> = {}): BuildSheet {
  return {
    id: 7,
    name: 'ZX head on ZY block',
    slots: { block: 'ZY-BL-1', head: 'ZX-HD-2' },
    targetPowerKw: 110,
    fuelOctane: null,
    chassisModelYear: null,
    vin: null,
    notes: '',
    owner: { id: 1, name: 'A. Tech' },
    createdAt: '2026-01-01T00:00:00.000Z',
    updatedAt: '2026-01-01T00:00:00.000Z',
    ...overrides,
  }
}

describe('planner store', () => {
  beforeEach(() => setActivePinia(createPinia()))

  it('takes a build from the address and gives the same address back', () => {
    const planner = usePlannerStore()
    planner.applyQuery({ head: 'ZX-HD-2', block: 'ZY-BL-1', power: '120', octane: '95' })
    expect(planner.filledCount).toBe(2)
    expect(planner.query).toEqual({ block: 'ZY-BL-1', head: 'ZX-HD-2', power: '120', octane: '95' })
  })

  it('changes the address when a slot is set, replaced or cleared', () => {
    const planner = usePlannerStore()
    planner.setSlot('head', ' ZX-HD-2 ')
    planner.setSlot('block', 'ZY-BL-1')
    planner.setSlot('head', null)
    expect(planner.query).toEqual({ block: 'ZY-BL-1' })
  })

  it('drops a context value that is cleared', () => {
    const planner = usePlannerStore()
    planner.setContext({ targetPowerKw: 90, fuelOctane: 91 })
    planner.setContext({ targetPowerKw: undefined })
    expect(planner.context).toEqual({ fuelOctane: 91 })
  })

  it('opens a saved sheet with its slots and context and reports changes against it', () => {
    const planner = usePlannerStore()
    planner.openSheet(sheet())
    expect(planner.query).toEqual({ block: 'ZY-BL-1', head: 'ZX-HD-2', power: '110' })
    expect(planner.isDirty).toBe(false)
    planner.setSlot('head-gasket', 'ZX-HG-1')
    expect(planner.isDirty).toBe(true)
    planner.setSlot('head-gasket', null)
    expect(planner.isDirty).toBe(false)
  })

  it('keeps the edits in the address when a shared link opens a sheet', () => {
    const planner = usePlannerStore()
    planner.applyQuery({ block: 'ZY-BL-9' })
    planner.openSheet(sheet(), true)
    expect(planner.sheet?.id).toBe(7)
    expect(planner.slots).toEqual({ block: 'ZY-BL-9' })
    expect(planner.isDirty).toBe(true)
  })

  it('saves every context field, clearing with null what the build no longer has', () => {
    const planner = usePlannerStore()
    planner.openSheet(sheet({ fuelOctane: 91 }))
    planner.setContext({ fuelOctane: undefined })
    expect(planner.sheetUpdate()).toEqual({
      slots: { block: 'ZY-BL-1', head: 'ZX-HD-2' },
      targetPowerKw: 110,
      fuelOctane: null,
      chassisModelYear: null,
      vin: null,
    })
    expect(planner.sheetInput('Copy', 'n')).toEqual({ slots: { block: 'ZY-BL-1', head: 'ZX-HD-2' }, targetPowerKw: 110, name: 'Copy', notes: 'n' })
  })

  it('puts the server\'s field messages next to the slot or field they name', () => {
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
    const fetchSpy = vi.spyOn(globalThis, 'fetch')
    const planner = usePlannerStore()
    planner.setContext({ targetPowerKw: 100 })
    await planner.evaluate()
    expect(fetchSpy).not.toHaveBeenCalled()
    expect(planner.result).toBeNull()
    fetchSpy.mockRestore()
  })
})
