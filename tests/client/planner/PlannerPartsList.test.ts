import { mount } from '@vue/test-utils'
import PrimeVue from 'primevue/config'
import { describe, expect, it } from 'vitest'
import PlannerPartsList from '@/components/planner/PlannerPartsList.vue'

describe('PlannerPartsList', () => {
  it('shows each line with its quantity and unit, and what it is for', () => {
    const wrapper = mount(PlannerPartsList, {
      global: { plugins: [PrimeVue] },
      props: {
        buildName: 'Test build',
        lines: [
          { partNumber: 'ZX-IN-1', description: 'Injector', quantity: 4, unit: 'piece', reason: 'Chosen injectors.', category: 'chosen' },
          { description: 'Injector O-rings', quantity: 4, unit: 'pair', reason: 'Single-use.', category: 'consumable' },
        ],
      },
    })
    const rows = wrapper
      .get('table')
      .findAll('tbody tr')
      .map((row) => row.findAll('td').map((cell) => cell.text()))
    expect(rows).toEqual([
      ['ZX-IN-1', 'Injector', '4', 'piece', 'Chosen part', 'Chosen injectors.'],
      ['—', 'Injector O-rings', '4', 'pair', 'Consumable', 'Single-use.'],
    ])
    expect(wrapper.get('button').text()).toContain('Export parts list (CSV)')
    expect(wrapper.get('button').attributes('disabled')).toBeUndefined()
  })

  it('offers no export while the list is empty', () => {
    const wrapper = mount(PlannerPartsList, { global: { plugins: [PrimeVue] }, props: { buildName: 'x', lines: [] } })
    expect(wrapper.find('table').exists()).toBe(false)
    expect(wrapper.get('button').attributes('disabled')).toBeDefined()
  })
})
