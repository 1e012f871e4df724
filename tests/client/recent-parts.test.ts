import { nextTick } from 'vue'
import { beforeEach, describe, expect, it, vi } from 'vitest'

const STORAGE_KEY = 'fitwright.recent-parts'

/** A fresh copy of the module, as on a page load. */
async function loadModule() {
  vi.resetModules()
  return import('@/composables/useRecentParts')
}

beforeEach(() => localStorage.clear())

describe('useRecentParts', () => {
  it('keeps the last opened parts newest first, without repeats, across a reload', async () => {
    const first = await loadModule()
    const { remember } = first.useRecentParts()
    remember({ partNumber: 'TM-HD-2000', name: 'Head', kind: 'head' })
    remember({ partNumber: 'TM-BL-1800', name: 'Block', kind: 'block' })
    remember({ partNumber: 'TM-HD-2000', name: 'Head', kind: 'head' })
    await nextTick()

    const reloaded = await loadModule()
    expect(reloaded.useRecentParts().recent.value.map((part) => part.partNumber)).toEqual(['TM-HD-2000', 'TM-BL-1800'])
  })

  it('ignores what it cannot read in storage instead of failing', async () => {
    localStorage.setItem(STORAGE_KEY, '{not json')
    const { useRecentParts } = await loadModule()
    expect(useRecentParts().recent.value).toEqual([])
  })

  it('drops stored entries without a part number and keeps at most eight', async () => {
    const heads = Array.from({ length: 10 }, (_, i) => ({ partNumber: `TM-HD-20${i}0`, name: 'Head', kind: 'head' }))
    localStorage.setItem(STORAGE_KEY, JSON.stringify([{ name: 'no number' }, ...heads]))
    const { useRecentParts } = await loadModule()
    expect(useRecentParts().recent.value.map((part) => part.partNumber)).toEqual(heads.slice(0, 8).map((part) => part.partNumber))
  })
})
