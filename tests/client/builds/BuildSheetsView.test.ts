import { flushPromises, mount } from '@vue/test-utils'
import { createPinia } from 'pinia'
import PrimeVue from 'primevue/config'
import ConfirmationService from 'primevue/confirmationservice'
import ToastService from 'primevue/toastservice'
import { afterEach, describe, expect, it, vi } from 'vitest'
import { h } from 'vue'
import { createMemoryHistory, createRouter } from 'vue-router'
import BuildSheetsView from '@/views/BuildSheetsView.vue'
import { formatDuration } from '@/lib/format'

const stored = [
  {
    id: 1,
    name: 'Bench swap for bay 3',
    slots: { block: 'TM-BL-1800', head: 'TM-HD-2000' },
    notes: '',
    verdict: 'fits-with-modification',
    labourMinutes: 150,
  },
  { id: 2, name: 'Race head', slots: { head: 'TM-HD-1800' }, notes: 'thin gasket', verdict: null, labourMinutes: null },
].map((sheet) => ({
  ...sheet,
  targetPowerKw: null,
  fuelOctane: null,
  chassisModelYear: null,
  vin: null,
  owner: { id: 1, name: 'A. Tech' },
  createdAt: '2026-01-01T00:00:00.000Z',
  updatedAt: '2026-03-04T09:05:00.000Z',
}))

async function mountList() {
  vi.stubGlobal('fetch', async () => new Response(JSON.stringify(stored), { status: 200, headers: { 'Content-Type': 'application/json' } }))
  const Blank = { render: () => h('p') }
  const router = createRouter({
    history: createMemoryHistory(),
    routes: [
      { path: '/builds', name: 'builds', component: BuildSheetsView },
      { path: '/planner', name: 'planner', component: Blank },
      { path: '/planner/:id', name: 'planner-sheet', component: Blank },
    ],
  })
  await router.push('/builds')
  const wrapper = mount(BuildSheetsView, {
    global: { plugins: [router, createPinia(), PrimeVue, ToastService, ConfirmationService] },
    attachTo: document.body,
  })
  await flushPromises()
  return wrapper
}

const rowNames = (wrapper: Awaited<ReturnType<typeof mountList>>) => wrapper.findAll('tbody tr a.name').map((link) => link.text())

afterEach(() => {
  vi.unstubAllGlobals()
  document.body.innerHTML = ''
})

describe('BuildSheetsView', () => {
  it('narrows the list to the sheets holding a typed part number, and says how many of how many', async () => {
    const wrapper = await mountList()
    expect(rowNames(wrapper)).toEqual(['Bench swap for bay 3', 'Race head'])

    await wrapper.get('input[type="search"]').setValue('TM-HD-1800')

    expect(rowNames(wrapper)).toEqual(['Race head'])
    expect(wrapper.get('.build-sheets-filters [role="status"]').text()).toBe('1 of 2 sheets')
  })

  it('says when nothing matches instead of showing an empty table', async () => {
    const wrapper = await mountList()
    await wrapper.get('input[type="search"]').setValue('no such build')
    expect(rowNames(wrapper)).toEqual([])
    expect(wrapper.text()).toContain('No build sheet matches.')
  })

  it('keeps Make a quote, Rename and Delete as separate labelled buttons for each sheet', async () => {
    const wrapper = await mountList()
    const row = wrapper.findAll('tbody tr')[1]!
    const labels = row.findAll('button').map((button) => button.attributes('aria-label'))
    expect(labels).toEqual(['Make a quote for Race head', 'Rename Race head', 'Delete Race head'])
    expect(row.get('button[aria-label="Delete Race head"]').classes()).toContain('delete')
  })

  it("shows each sheet's verdict and labour as saved, and a dash for a sheet saved before they were kept", async () => {
    const wrapper = await mountList()
    const headers = wrapper.findAll('thead th').map((th) => th.text())
    const column = (row: number, name: string) => wrapper.findAll('tbody tr')[row]!.findAll('td')[headers.indexOf(name)]!.text()
    expect(column(0, 'Verdict')).toBe('Fits with modification')
    expect(column(0, 'Labour')).toBe(formatDuration(150))
    expect(column(0, 'Labour')).toMatch(/2\D+30/)
    expect(column(1, 'Verdict')).toBe('—')
    expect(column(1, 'Labour')).toBe('—')
  })
})
