import { mount, RouterLinkStub } from '@vue/test-utils'
import { createPinia, setActivePinia } from 'pinia'
import { beforeEach, describe, expect, it } from 'vitest'
import PlannerPairs from '@/components/planner/PlannerPairs.vue'
import { useSessionStore } from '@/stores/session'
import { makePair } from '../../helpers/client-factories'

beforeEach(() => setActivePinia(createPinia()))

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
    const wrapper = mount(PlannerPairs, { props: { pairs: [pair] }, global: { stubs: { RouterLink: RouterLinkStub } } })
    expect(wrapper.get('.reason').text()).toBe('The gasket bore 84.5 mm is smaller than the 86 mm cylinder bore.')
    expect(wrapper.find('.print-only').exists()).toBe(true)
    expect(wrapper.get('.print-only').text()).toContain('P10-A')
  })

  it('says how many field reports confirmed the deciding link, linking a tech to the reports on that link', async () => {
    const pair = {
      ...makePair(['head', 'block'], 'fits', 'Head on block'),
      partNumbers: ['TM-HD-2000R', 'TM-BL-1800'] as [string, string],
      decidedBy: 'link' as const,
      fieldReports: { confirmed: 2, contradicted: 1 },
      linkParts: ['TM-BL-1800', 'TM-HD-2000'] as [string, string],
    }
    const counter = mount(PlannerPairs, { props: { pairs: [pair] }, global: { stubs: { RouterLink: RouterLinkStub } } })
    expect(counter.text()).toContain('confirmed by 2 field reports')
    expect(counter.text()).toContain('1 field report found otherwise')
    // A counter may not read the reports: the count is plain text.
    expect(counter.findAllComponents(RouterLinkStub)).toHaveLength(0)

    useSessionStore().user = {
      id: 4,
      email: 'tech@fitwright.test',
      name: 'Tech',
      role: 'tech',
      disabled: false,
      invitePending: false,
      homeSiteId: null,
    }
    const tech = mount(PlannerPairs, { props: { pairs: [pair] }, global: { stubs: { RouterLink: RouterLinkStub } } })
    const link = tech.getComponent(RouterLinkStub)
    expect(link.text()).toContain('confirmed by 2 field reports')
    expect(link.props('to')).toEqual({ name: 'field-reports', query: { from: 'TM-BL-1800', to: 'TM-HD-2000' } })
  })
})
