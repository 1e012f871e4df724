import { mount } from '@vue/test-utils'
import { describe, expect, it } from 'vitest'
import PlannerCautions from '@/components/planner/PlannerCautions.vue'
import { DEFERENCE } from '@shared/advisory'

describe('PlannerCautions', () => {
  it('shows every caution in the page, danger first, with the deference to the manual, local codes and licensed practice once', () => {
    const wrapper = mount(PlannerCautions, {
      props: {
        // The server's order: danger, warning, info, with the deference sentence among the notes.
        cautions: [
          { severity: 'danger', text: 'Never work under a load held only by a jack.' },
          { severity: 'warning', text: 'Disconnect the battery first.' },
          { severity: 'info', text: 'Check local emissions rules.', reference: 'a regulation' },
          DEFERENCE,
        ],
      },
    })
    const items = wrapper.get('ul').findAll('li')
    expect(items.map((item) => item.attributes('data-severity'))).toEqual(['danger', 'warning', 'info'])
    expect(items[0]?.text()).toContain('Danger: Never work under a load held only by a jack.')
    expect(items[2]?.text()).toContain('Source: a regulation')
    expect(wrapper.text()).toContain('Fitwright defers to the service manual, local codes and licensed practice.')
    expect(wrapper.text().split(DEFERENCE.text).length - 1).toBe(0)
  })

  it('lists the cautions in the order given, since the server orders them, without sorting again', () => {
    const wrapper = mount(PlannerCautions, {
      props: {
        cautions: [
          { severity: 'info', text: 'Keep the old gasket for comparison.' },
          { severity: 'warning', text: 'Torque-to-yield head bolts: fit new ones.' },
          { severity: 'warning', text: 'Relieve fuel pressure before opening the rail.' },
        ],
      },
    })
    const texts = wrapper
      .get('ul')
      .findAll('li')
      .map((item) => item.text())
    expect(texts).toEqual([
      'Note: Keep the old gasket for comparison.',
      'Warning: Torque-to-yield head bolts: fit new ones.',
      'Warning: Relieve fuel pressure before opening the rail.',
    ])
  })

  it('keeps the deference sentence even when the rules raise no caution', () => {
    const wrapper = mount(PlannerCautions, { props: { cautions: [] } })
    expect(wrapper.find('ul').exists()).toBe(false)
    expect(wrapper.text()).toContain('defers to the service manual')
  })
})
