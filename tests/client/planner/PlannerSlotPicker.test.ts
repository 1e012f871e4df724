import { flushPromises, mount } from '@vue/test-utils'
import PrimeVue from 'primevue/config'
import { afterEach, describe, expect, it, vi } from 'vitest'
import { BUILD_SLOTS } from '@shared/build-template'
import PlannerSlotPicker from '@/components/planner/PlannerSlotPicker.vue'
import { makeCandidate, makePart } from '../../helpers/client-factories'

const headSlot = BUILD_SLOTS.find((slot) => slot.id === 'head')!
const fitting = makePart('TM-HD-2000', 'head')
const typed = makePart('TM-HD-1800', 'head')

/**
 * The network edge, held: each request waits until the test lets it answer, so the
 * answer to the search made at focus can arrive after the scanner's text.
 */
function heldServer(candidate = makeCandidate(fitting)) {
  const waiting: (() => void)[] = []
  vi.stubGlobal('fetch', (url: string) => {
    const path = new URL(url, 'http://fitwright.test')
    const q = path.searchParams.get('q') ?? ''
    const body =
      path.pathname === '/api/builds/complete'
        ? { slots: { head: { matesWith: ['block'], candidates: [candidate] } } }
        : { items: [fitting, typed].filter((part) => part.partNumber.includes(q.toUpperCase())), total: 2 }
    return new Promise<Response>((resolve) =>
      waiting.push(() => resolve(new Response(JSON.stringify(body), { status: 200, headers: { 'Content-Type': 'application/json' } }))),
    )
  })
  return {
    answerAll: async () => {
      while (waiting.length) waiting.shift()!()
      await flushPromises()
    },
  }
}

afterEach(() => {
  vi.useRealTimers()
  vi.unstubAllGlobals()
  document.body.innerHTML = ''
})

describe('PlannerSlotPicker', () => {
  it('opens exactly the typed number on Enter when it arrived whole at focus and the focus list answered late', async () => {
    const server = heldServer()
    const wrapper = mount(PlannerSlotPicker, {
      props: { buildSlot: headSlot, build: () => ({ slots: { block: 'TM-BL-1800' }, context: {} }) },
      global: { plugins: [PrimeVue] },
      attachTo: document.body,
    })
    const input = wrapper.get<HTMLInputElement>('input[role="combobox"]')

    await input.trigger('focus')
    input.element.value = 'TM-HD-1800'
    await input.trigger('input')
    await server.answerAll()
    // The list on show answers the empty search made at focus, its first suggestion highlighted.
    expect(document.body.querySelector('[role="listbox"]')?.textContent).toContain('TM-HD-2000')
    await input.trigger('keydown', { key: 'Enter', code: 'Enter' })

    expect(wrapper.emitted('set')).toEqual([['TM-HD-1800']])
  })

  it('takes the highlighted suggestion on Enter after a partial number', async () => {
    vi.useFakeTimers({ toFake: ['setTimeout', 'clearTimeout'] })
    const server = heldServer()
    const wrapper = mount(PlannerSlotPicker, {
      props: { buildSlot: headSlot, build: () => ({ slots: { block: 'TM-BL-1800' }, context: {} }) },
      global: { plugins: [PrimeVue] },
      attachTo: document.body,
    })
    const input = wrapper.get<HTMLInputElement>('input[role="combobox"]')
    await input.trigger('focus')
    await server.answerAll()
    input.element.value = 'TM-HD-2'
    await input.trigger('input')
    // The picker searches once typing pauses.
    vi.advanceTimersByTime(200)
    await server.answerAll()
    vi.useRealTimers()
    await input.trigger('keydown', { key: 'Enter', code: 'Enter' })

    expect(wrapper.emitted('set')).toEqual([['TM-HD-2000']])
  })

  it('shows on a suggestion what is on the shelf, and nothing of the kind on a part only found by search', async () => {
    const stock = {
      available: 2,
      bestCondition: 'used' as const,
      minPriceCents: 2500,
      maxPriceCents: 17500,
      sites: ['Yard B', 'Lot A'],
      nearestSite: 'Yard B',
    }
    const server = heldServer({ ...makeCandidate(fitting), stock })
    const wrapper = mount(PlannerSlotPicker, {
      props: { buildSlot: headSlot, build: () => ({ slots: { block: 'TM-BL-1810' }, context: {} }) },
      global: { plugins: [PrimeVue] },
      attachTo: document.body,
    })
    // Another build than the tests above: the picker keeps answers by build.
    await wrapper.get('input[role="combobox"]').trigger('focus')
    await server.answerAll()

    const options = [...document.body.querySelectorAll('[role="option"]')].map((option) => option.textContent ?? '')
    expect(options.find((text) => text.includes('TM-HD-2000'))).toMatch(
      /2 in stock · best used · 25\.00–175\.00\s*nearest: Yard B · also Lot A/,
    )
    expect(options.find((text) => text.includes('TM-HD-1800'))).not.toContain('stock')
  })
})
