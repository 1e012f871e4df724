import { mount } from '@vue/test-utils'
import { describe, expect, it } from 'vitest'
import PlannerPairs from '@/components/planner/PlannerPairs.vue'
import { makePair } from '../../helpers/client-factories'

describe('PlannerPairs', () => {
  it('shows the deciding reason first, not the first piece of evidence, and keeps all evidence for print', () => {
    const pair = {
      ...makePair(['head-gasket', 'block'], 'does-not-fit', 'Head gasket on block'),
      reason: 'The gasket bore 84.5 mm is smaller than the 86 mm cylinder bore.',
      explanation: [
        { type: 'rule' as const, relation: 'fits' as const, text: 'Gasket bolt pattern P10-A matches the block.' },
        {
          type: 'rule' as const,
          relation: 'does-not-fit' as const,
          text: 'The gasket bore 84.5 mm is smaller than the 86 mm cylinder bore.',
        },
      ],
    }
    const wrapper = mount(PlannerPairs, { props: { pairs: [pair] } })
    expect(wrapper.get('.reason').text()).toBe('The gasket bore 84.5 mm is smaller than the 86 mm cylinder bore.')
    expect(wrapper.find('.print-only').exists()).toBe(true)
    expect(wrapper.get('.print-only').text()).toContain('P10-A')
  })
})
