import { mount } from '@vue/test-utils'
import { describe, expect, it } from 'vitest'
import PlannerVerdict from '@/components/planner/PlannerVerdict.vue'
import { makeEvaluation, makePair } from '../../helpers/client-factories'

function mountVerdict(props: InstanceType<typeof PlannerVerdict>['$props']) {
  return mount(PlannerVerdict, { props })
}

describe('PlannerVerdict', () => {
  it.each([
    ['fits', 'The build fits', 'pi-check-circle'],
    ['fits-with-modification', 'The build fits with modifications', 'pi-wrench'],
    ['does-not-fit', 'The build does not fit', 'pi-ban'],
    ['unknown', 'No verdict yet', 'pi-question-circle'],
  ] as const)('tells the verdict %s in words and with an icon, in a live status region', (verdict, words, icon) => {
    const wrapper = mountVerdict({ evaluation: makeEvaluation({ verdict }), filledCount: 2, isLoading: false })
    const status = wrapper.get('[role="status"]')
    expect(status.attributes('aria-live')).toBe('polite')
    expect(status.get('h2').text()).toContain(words)
    expect(status.find(`i.${icon}`).exists()).toBe(true)
  })

  it('names the pairs that do not fit', () => {
    const evaluation = makeEvaluation({
      verdict: 'does-not-fit',
      pairs: [
        makePair(['head', 'block'], 'fits', 'Head on block'),
        makePair(['intake-manifold', 'head'], 'does-not-fit', 'Intake manifold on head'),
      ],
    })
    const wrapper = mountVerdict({ evaluation, filledCount: 3, isLoading: false })
    expect(wrapper.text()).toContain('Does not fit: Intake manifold on head.')
    expect(wrapper.text()).not.toContain('Head on block')
  })

  it('lists the empty slots by their labels and says the verdict covers the chosen parts only', () => {
    const wrapper = mountVerdict({
      evaluation: makeEvaluation({ missingSlots: ['oil-restrictor', 'injector'] }),
      filledCount: 16,
      isLoading: false,
    })
    expect(wrapper.get('h2').text()).toBe('The parts chosen so far fit')
    expect(wrapper.text()).toContain('2 of 18 slots empty: Oil feed restrictor, Injectors.')
    expect(wrapper.text()).toContain('covers the chosen parts only')
  })

  it('invites a first choice when nothing is chosen', () => {
    const wrapper = mountVerdict({ evaluation: null, filledCount: 0, isLoading: false })
    expect(wrapper.get('h2').text()).toBe('No parts chosen yet')
  })
})
