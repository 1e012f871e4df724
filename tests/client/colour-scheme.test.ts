import { nextTick } from 'vue'
import { beforeEach, describe, expect, it, vi } from 'vitest'
import { DARK_MODE_CLASS } from '@/theme/preset'

const STORAGE_KEY = 'fitwright.colour-scheme'

/** A fresh copy of the module, as on a page load. */
async function loadModule() {
  vi.resetModules()
  return import('@/composables/useColourScheme')
}

beforeEach(() => {
  localStorage.clear()
  document.documentElement.classList.remove(DARK_MODE_CLASS)
})

describe('useColourScheme', () => {
  it('applies the stored scheme as soon as the module loads, before any component asks for it', async () => {
    localStorage.setItem(STORAGE_KEY, 'dark')
    await loadModule()
    expect(document.documentElement.classList.contains(DARK_MODE_CLASS)).toBe(true)
  })

  it('writes the class and the stored choice once per toggle however many components use it', async () => {
    localStorage.setItem(STORAGE_KEY, 'light')
    const { useColourScheme } = await loadModule()
    const setItem = vi.spyOn(localStorage, 'setItem')
    const users = [useColourScheme(), useColourScheme(), useColourScheme()]

    users[1]!.toggle()
    await nextTick()

    expect(users.map((user) => user.scheme.value)).toEqual(['dark', 'dark', 'dark'])
    expect(document.documentElement.classList.contains(DARK_MODE_CLASS)).toBe(true)
    expect(setItem.mock.calls).toEqual([[STORAGE_KEY, 'dark']])
    setItem.mockRestore()
  })

  it('follows the device setting until someone chooses', async () => {
    const dark = (query: string) => ({ matches: query.includes('dark'), media: query, addEventListener() {}, removeEventListener() {} })
    vi.stubGlobal('matchMedia', dark)
    const { useColourScheme } = await loadModule()
    expect(useColourScheme().scheme.value).toBe('dark')
    expect(document.documentElement.classList.contains(DARK_MODE_CLASS)).toBe(true)
    vi.unstubAllGlobals()
  })
})
