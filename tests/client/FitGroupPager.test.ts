import { mount } from '@vue/test-utils'
import PrimeVue from 'primevue/config'
import { describe, expect, it } from 'vitest'
import type { FitGroupPage } from '@shared/schemas/fitment'
import FitGroupPager from '@/components/fits/FitGroupPager.vue'
import { makeFit, makePart } from '../helpers/client-factories'

const section = (offset: number, shown: number, total: number): FitGroupPage => ({
  kind: 'head-gasket',
  relation: 'fits',
  source: 'inferred',
  total,
  offset,
  results: Array.from({ length: shown }, (_, i) => makeFit(makePart(`ZX-HG-${offset + i}`, 'head-gasket'), 'fits', 'inferred')),
})
const mountPager = (props: { section: FitGroupPage; pageSize: number }) => mount(FitGroupPager, { props, global: { plugins: [PrimeVue] } })

describe('FitGroupPager', () => {
  it('says how many of the group are shown and asks for the next page with "Show more"', async () => {
    const wrapper = mountPager({ section: section(0, 20, 812), pageSize: 20 })
    expect(wrapper.get('[role="status"]').text()).toBe('Showing 20 of 812 inferred by the rules')
    const buttons = wrapper.findAll('button')
    expect(buttons.map((b) => b.text())).toEqual(['Show more'])
    await buttons[0]!.trigger('click')
    expect(wrapper.emitted('page')).toEqual([[2]])
  })

  it('on a later page shows the range and goes back or on', async () => {
    const wrapper = mountPager({ section: section(40, 20, 812), pageSize: 20 })
    expect(wrapper.get('[role="status"]').text()).toBe('Showing 41–60 of 812 inferred by the rules')
    const [previous, more] = wrapper.findAll('button')
    await previous!.trigger('click')
    await more!.trigger('click')
    expect(wrapper.emitted('page')).toEqual([[2], [4]])
  })

  it('shows nothing when the whole group fits on the first page', () => {
    const wrapper = mountPager({ section: section(0, 4, 4), pageSize: 20 })
    expect(wrapper.find('[role="group"]').exists()).toBe(false)
  })
})
