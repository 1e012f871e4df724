import { mount } from '@vue/test-utils'
import { describe, expect, it } from 'vitest'
import PlannerCautions from '@/components/planner/PlannerCautions.vue'

describe('PlannerCautions with service manual sections', () => {
  it('shows the governing manual section beside its own caution only', () => {
    const wrapper = mount(PlannerCautions, {
      props: {
        cautions: [
          { severity: 'warning', text: 'Torque-to-yield head bolts are single-use.', manual: 'head bolt torque sequence and angle' },
          { severity: 'warning', text: 'Turn the engine by hand two full turns.', manual: 'timing marks and belt tension' },
          { severity: 'info', text: 'Keep the old gasket for comparison.' },
        ],
      },
    })
    const items = wrapper.get('ul').findAll('li')
    expect(items[0]!.get('.manual').text()).toBe('Service manual: head bolt torque sequence and angle')
    expect(items[1]!.get('.manual').text()).toBe('Service manual: timing marks and belt tension')
    expect(items[2]!.find('.manual').exists()).toBe(false)
  })
})
