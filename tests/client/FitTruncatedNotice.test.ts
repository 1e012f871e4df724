import { mount } from '@vue/test-utils'
import { describe, expect, it } from 'vitest'
import FitTruncatedNotice from '@/components/fits/FitTruncatedNotice.vue'

describe('FitTruncatedNotice', () => {
  it('says, per kind and relation, how many inferred answers are shown of how many', () => {
    const wrapper = mount(FitTruncatedNotice, { props: { truncated: [{ kind: 'head-gasket', relation: 'fits', shown: 50, total: 812 }] } })
    expect(wrapper.get('[role="note"]').text()).toContain('Head gasket, fits: showing 50 of 812')
  })

  it('writes large counts with the locale group separator', () => {
    const wrapper = mount(FitTruncatedNotice, { props: { truncated: [{ kind: 'head-gasket', relation: 'fits', shown: 50, total: 120071 }] } })
    // The test runtime's locale is en-US; CLDR groups thousands there with a comma.
    expect(wrapper.get('[role="note"]').text()).toContain('showing 50 of 120,071')
  })

  it('shows nothing when no answer was cut', () => {
    const wrapper = mount(FitTruncatedNotice, { props: { truncated: [] } })
    expect(wrapper.find('[role="note"]').exists()).toBe(false)
  })
})
