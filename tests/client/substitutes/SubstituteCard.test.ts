import { mount, RouterLinkStub } from '@vue/test-utils'
import PrimeVue from 'primevue/config'
import { describe, expect, it } from 'vitest'
import type { Substitute } from '@shared/schemas/substitutes'
import SubstituteCard from '@/components/substitutes/SubstituteCard.vue'
import { makePart } from '../../helpers/client-factories'

const original = makePart('ZX-HD-1810', 'head')
const substitute = (overrides: Partial<Substitute> = {}): Substitute => ({
  part: makePart('ZX-HD-1800', 'head'),
  sharedCount: 1,
  shared: ['ZX-BL-1800'],
  differences: [
    { name: 'chamberCc', this: 46, other: 48 },
    { name: 'oilRestrictor', this: true, other: null },
  ],
  ...overrides,
})
const mountCard = (item: Substitute) =>
  mount(SubstituteCard, { props: { original, substitute: item }, global: { plugins: [PrimeVue], stubs: { RouterLink: RouterLinkStub } } })

describe('SubstituteCard', () => {
  it('shows the differing attributes side by side under each part number, a missing value as a dash', () => {
    const wrapper = mountCard(substitute())
    const headers = wrapper.findAll('thead th').map((cell) => cell.text())
    expect(headers).toEqual(['Attribute', 'ZX-HD-1810', 'ZX-HD-1800'])
    const rows = wrapper.findAll('tbody tr').map((row) => row.findAll('th, td').map((cell) => cell.text()))
    expect(rows).toEqual([
      ['Chamber (cc)', '46', '48'],
      ['Restricts the head oil feed', 'Yes', '—'],
    ])
  })

  it('names the shared mating parts and counts the ones not listed', () => {
    const wrapper = mountCard(substitute({ sharedCount: 1234, shared: ['ZX-BL-1800', 'ZX-BL-2000'] }))
    expect(wrapper.get('.shared').text()).toContain('Fits 1,234 of the same mating parts')
    expect(wrapper.get('.shared').text()).toContain('ZX-BL-1800, ZX-BL-2000 and 1,232 more')
    expect(wrapper.getComponent(RouterLinkStub).props('to')).toEqual({ name: 'part', params: { partNumber: 'ZX-HD-1800' } })
  })

  it('says nothing catalogued differs instead of an empty table', () => {
    const wrapper = mountCard(substitute({ differences: [] }))
    expect(wrapper.find('table').exists()).toBe(false)
    expect(wrapper.text()).toContain('No catalogued attribute differs.')
  })
})
