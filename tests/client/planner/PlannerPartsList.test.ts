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
      ['ZX-IN-1', 'Injector', '4', 'piece', '—', 'Chosen part', 'Chosen injectors.'],
      ['—', 'Injector O-rings', '4', 'pair', '—', 'Consumable', 'Single-use.'],
    ])
    expect(wrapper.get('button').text()).toContain('Export parts list (CSV)')
    expect(wrapper.get('button').attributes('disabled')).toBeUndefined()
  })

  it('shows on each line with a part number the units to take, or "order" for what the shelf lacks', () => {
    const unit = { site: 'Yard B', location: 'Rack H4', condition: 'used' as const, priceCents: 17500 }
    const chosen = { unit: 'piece', reason: 'Chosen.', category: 'chosen' as const }
    const wrapper = mount(PlannerPartsList, {
      global: { plugins: [PrimeVue] },
      props: {
        buildName: 'Test build',
        lines: [
          {
            ...chosen,
            partNumber: 'ZX-HD-1',
            description: 'Head',
            quantity: 1,
            shelf: { take: [{ ...unit, stockItemId: 7 }], toOrder: 0 },
          },
          { ...chosen, partNumber: 'ZX-GK-1', description: 'Gasket', quantity: 1, shelf: { take: [], toOrder: 1 } },
          {
            ...chosen,
            partNumber: 'ZX-VL-1',
            description: 'Valve',
            quantity: 4,
            shelf: { take: [{ ...unit, stockItemId: 8, condition: 'new', priceCents: 1200 }], toOrder: 3 },
          },
        ],
      },
    })
    const shelf = wrapper.findAll('tbody tr').map((row) =>
      row
        .findAll('td')[4]!
        .findAll('li')
        .map((item) => item.text()),
    )
    expect(shelf).toEqual([['Yard B · Rack H4 · used · 175.00'], ['order'], ['Yard B · Rack H4 · new · 12.00', 'order 3 more']])
  })

  it('offers no export while the list is empty', () => {
    const wrapper = mount(PlannerPartsList, { global: { plugins: [PrimeVue] }, props: { buildName: 'x', lines: [] } })
    expect(wrapper.find('table').exists()).toBe(false)
    expect(wrapper.get('button').attributes('disabled')).toBeDefined()
  })
})
