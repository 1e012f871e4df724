import { flushPromises, mount } from '@vue/test-utils'
import { createPinia } from 'pinia'
import PrimeVue from 'primevue/config'
import ToastService from 'primevue/toastservice'
import { afterEach, describe, expect, it, vi } from 'vitest'
import { h } from 'vue'
import { createMemoryHistory, createRouter } from 'vue-router'
import QuotesView from '@/views/QuotesView.vue'

const noVehicle = { modelYear: null, vin: null, make: null, model: null, engineFamily: null }

/** `count` quotes, newest (highest id) first, as the server answers a page of them. */
function summaries(count: number) {
  return Array.from({ length: count }, (_, index) => ({
    id: 60 - index,
    status: 'draft',
    customer: `Customer ${60 - index}`,
    buildName: null,
    vehicle: index === 0 ? { modelYear: 1994, vin: 'TMWVL3414R1234567', make: 'Talmark', model: 'Vell', engineFamily: 'TK20V' } : noVehicle,
    totalCents: 10_000,
    currency: 'EUR',
    createdBy: 'Tech',
    createdAt: '2026-03-04T09:05:00.000Z',
    reservedUntil: null,
  }))
}

/** The network edge: every GET /api/quotes is kept; the answer is one page of `total` quotes. */
function stubServer(total: number) {
  const asked: URLSearchParams[] = []
  const all = summaries(total)
  vi.stubGlobal('fetch', async (url: string) => {
    const params = new URL(url, 'http://fitwright.test').searchParams
    asked.push(params)
    const page = Number(params.get('page') ?? 1)
    const size = Number(params.get('pageSize') ?? 25)
    const q = params.get('q') ?? ''
    const found = all.filter((quote) => quote.customer.toLowerCase().includes(q.toLowerCase()))
    const body = { items: found.slice((page - 1) * size, page * size), total: found.length, page, pageSize: size }
    return new Response(JSON.stringify(body), { status: 200, headers: { 'Content-Type': 'application/json' } })
  })
  return asked
}

async function mountList() {
  const Blank = { render: () => h('p') }
  const router = createRouter({
    history: createMemoryHistory(),
    routes: [
      { path: '/quotes', name: 'quotes', component: QuotesView },
      { path: '/quotes/:id', name: 'quote', component: Blank },
    ],
  })
  await router.push('/quotes')
  const wrapper = mount(QuotesView, { global: { plugins: [router, createPinia(), PrimeVue, ToastService] }, attachTo: document.body })
  await flushPromises()
  return wrapper
}

const rows = (wrapper: Awaited<ReturnType<typeof mountList>>) => wrapper.findAll('tbody tr')

afterEach(() => {
  vi.useRealTimers()
  vi.unstubAllGlobals()
  document.body.innerHTML = ''
})

describe('QuotesView', () => {
  it('asks for the first page, shows the total and each quote’s vehicle', async () => {
    const asked = stubServer(30)
    const wrapper = await mountList()

    expect(asked.map((params) => params.toString())).toEqual(['page=1&pageSize=25'])
    expect(rows(wrapper)).toHaveLength(25)
    expect(wrapper.text()).toContain('30 quotes')
    expect(rows(wrapper)[0]!.text()).toContain('Talmark Vell, TK20V engine')
    expect(rows(wrapper)[0]!.text()).toContain('TMWVL3414R1234567')
    wrapper.unmount()
  })

  it('asks for the next page from the paginator', async () => {
    const asked = stubServer(30)
    const wrapper = await mountList()

    await wrapper.get('button[aria-label="Next Page"]').trigger('click')
    await flushPromises()

    expect(asked.at(-1)?.get('page')).toBe('2')
    expect(rows(wrapper)).toHaveLength(5)
    expect(rows(wrapper)[0]!.text()).toContain('Customer 35')
    wrapper.unmount()
  })

  it('searches once typing pauses, from the first page, not on every key', async () => {
    vi.useFakeTimers()
    const asked = stubServer(30)
    const wrapper = await mountList()
    await wrapper.get('button[aria-label="Next Page"]').trigger('click')
    await flushPromises()
    const before = asked.length

    const box = wrapper.get('#quotes-search')
    await box.setValue('Customer 4')
    await box.setValue('Customer 42')
    await vi.advanceTimersByTimeAsync(100)
    expect(asked).toHaveLength(before)
    await vi.advanceTimersByTimeAsync(400)
    await flushPromises()

    expect(asked.slice(before).map((params) => params.toString())).toEqual(['q=Customer+42&page=1&pageSize=25'])
    expect(rows(wrapper).map((row) => row.text())).toEqual([expect.stringContaining('Customer 42')])
    wrapper.unmount()
  })

  it('says when a search finds nothing', async () => {
    vi.useFakeTimers()
    stubServer(3)
    const wrapper = await mountList()
    await wrapper.get('#quotes-search').setValue('nobody')
    await vi.advanceTimersByTimeAsync(400)
    await flushPromises()
    expect(wrapper.text()).toContain('No quote matches “nobody”.')
    wrapper.unmount()
  })
})
