import { flushPromises, mount } from '@vue/test-utils'
import PrimeVue from 'primevue/config'
import { afterEach, describe, expect, it, vi } from 'vitest'
import SecurityEventsView from '@/views/SecurityEventsView.vue'
import { formatDateTime } from '@/lib/format'

const event = (id: number, kind: string) => ({
  id,
  kind,
  at: '2026-03-04T08:15:00.000Z',
  actorId: 1,
  actorEmail: 'admin@fitwright.test',
  address: '192.0.2.7',
  detail: kind === 'disable' ? 'tech@fitwright.test' : null,
})

/** The network edge: answers each page request with 60 events in all, and keeps the queries asked. */
function stubServer() {
  const queries: URLSearchParams[] = []
  vi.stubGlobal('fetch', async (url: string) => {
    const query = new URL(url, 'http://fitwright.test').searchParams
    queries.push(query)
    const page = Number(query.get('page'))
    const events = page === 1 ? [event(60, 'disable'), event(59, 'sign_in')] : [event(10, 'sign_in_failed')]
    return new Response(JSON.stringify({ events, total: 60, page, pageSize: 50 }), {
      status: 200,
      headers: { 'Content-Type': 'application/json' },
    })
  })
  return queries
}

afterEach(() => {
  vi.unstubAllGlobals()
  document.body.innerHTML = ''
})

describe('SecurityEventsView', () => {
  it('shows each event with its kind in words, the time formatted, who, from where and what', async () => {
    stubServer()
    const wrapper = mount(SecurityEventsView, { global: { plugins: [PrimeVue] }, attachTo: document.body })
    await flushPromises()

    const rows = wrapper.findAll('tbody tr')
    expect(rows).toHaveLength(2)
    expect(rows[0]!.text()).toContain('Account disabled')
    expect(rows[0]!.text()).toContain(formatDateTime('2026-03-04T08:15:00.000Z'))
    expect(rows[0]!.text()).toContain('admin@fitwright.test')
    expect(rows[0]!.text()).toContain('192.0.2.7')
    expect(rows[0]!.text()).toContain('tech@fitwright.test')
    expect(rows[1]!.text()).toContain('Signed in')
    wrapper.unmount()
  })

  it('asks the server for the next page when the paginator moves on', async () => {
    const queries = stubServer()
    const wrapper = mount(SecurityEventsView, { global: { plugins: [PrimeVue] }, attachTo: document.body })
    await flushPromises()

    await wrapper.get('button[aria-label="Next Page"]').trigger('click')
    await flushPromises()

    expect(queries.map((query) => query.get('page'))).toEqual(['1', '2'])
    expect(wrapper.text()).toContain('Failed sign-in')
    wrapper.unmount()
  })
})
