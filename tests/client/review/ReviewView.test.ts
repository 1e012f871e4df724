import { flushPromises, mount, RouterLinkStub } from '@vue/test-utils'
import PrimeVue from 'primevue/config'
import Toast from 'primevue/toast'
import ToastService from 'primevue/toastservice'
import { afterEach, describe, expect, it, vi } from 'vitest'
import { defineComponent, h } from 'vue'
import ReviewView from '@/views/ReviewView.vue'

const contradictedLink = {
  id: 7,
  from: 'TM-HD-1800',
  to: 'TM-BL-1800',
  relation: 'fits',
  modifications: [],
  note: '',
  source: 'demo',
  status: 'approved',
  createdAt: '2026-11-01T08:00:00.000Z',
  updatedAt: '2026-11-01T08:00:00.000Z',
  contradictedBy: 2,
}

type Call = { method: string; path: string; query: string; body: unknown }

/** The network edge: the two review lists, the CSRF token and the link's update; keeps what was sent. */
function stubServer() {
  const calls: Call[] = []
  const json = (body: unknown) => new Response(JSON.stringify(body), { status: 200, headers: { 'Content-Type': 'application/json' } })
  vi.stubGlobal('fetch', async (url: string, init: RequestInit = {}) => {
    const address = new URL(url, 'http://fitwright.test')
    const method = init.method ?? 'GET'
    calls.push({
      method,
      path: address.pathname,
      query: address.search,
      body: typeof init.body === 'string' ? JSON.parse(init.body) : null,
    })
    if (address.pathname === '/api/auth/csrf') return json({ token: 'test-token' })
    if (method === 'PATCH') return json({ ...contradictedLink, status: 'rejected' })
    const contradicted = address.searchParams.get('contradicted') === '1'
    return json({ items: contradicted ? [contradictedLink] : [], total: contradicted ? 1 : 0 })
  })
  return calls
}

afterEach(() => vi.unstubAllGlobals())

describe('ReviewView: links a field report found otherwise', () => {
  it('lists approved links contradicted by field reports with a way to the reports, and rejects one on request', async () => {
    const calls = stubServer()
    const Host = defineComponent({ render: () => [h(Toast), h(ReviewView)] })
    const wrapper = mount(Host, {
      global: { plugins: [PrimeVue, ToastService], stubs: { RouterLink: RouterLinkStub } },
      attachTo: document.body,
    })
    await flushPromises()

    const table = wrapper.get('table[aria-label="Contradicted links"]')
    expect(table.text()).toContain('2 field reports found otherwise')
    const reports = wrapper.findAllComponents(RouterLinkStub).find((link) => link.text().includes('found otherwise'))
    expect(reports?.props('to')).toEqual({ name: 'field-reports', query: { from: 'TM-HD-1800', to: 'TM-BL-1800' } })

    await wrapper.get('button[aria-label="Reject the link TM-HD-1800 with TM-BL-1800"]').trigger('click')
    await flushPromises()
    expect(calls).toContainEqual(expect.objectContaining({ method: 'PATCH', path: '/api/links/7', body: { status: 'rejected' } }))
    wrapper.unmount()
  })
})
