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

describe('PlannerVerdict with road-legality and errors', () => {
  it('states both the mechanical verdict and a legal blocker, never "fits" alone', () => {
    const evaluation = makeEvaluation({
      verdict: 'fits-with-modification',
      compliance: { status: 'blocked', reasons: ['This vehicle is model year 1999: it must keep a working OBD-II system.'] },
    })
    evaluation.figures.chassisModelYear = 1999
    const wrapper = mountVerdict({ evaluation, filledCount: 3, isLoading: false })
    expect(wrapper.get('h2').text()).toBe('The build fits with modifications — not road-legal for a 1999 car')
    expect(wrapper.text()).toContain('Not road-legal: This vehicle is model year 1999')
    expect(wrapper.get('section').attributes('data-compliance')).toBe('blocked')
  })

  it('says nothing extra when compliance is ok', () => {
    const wrapper = mountVerdict({ evaluation: makeEvaluation({ verdict: 'fits' }), filledCount: 2, isLoading: false })
    expect(wrapper.get('h2').text()).toBe('The build fits')
    expect(wrapper.text()).not.toContain('road-legal')
  })

  it('turns into an error naming the field, with a link to its input, instead of "Checking the build…"', async () => {
    const wrapper = mount(PlannerVerdict, {
      props: {
        evaluation: null,
        filledCount: 2,
        isLoading: false,
        errors: [{ field: 'fuelOctane', label: 'Fuel octane', message: 'Octane must be between 80 and 120.', inputId: 'ctx-octane' }],
      },
      attachTo: document.body,
    })
    const alert = wrapper.get('[role="alert"]')
    expect(alert.text()).toContain('One value cannot be judged')
    expect(alert.text()).toContain('Fuel octane: Octane must be between 80 and 120.')
    expect(wrapper.text()).not.toContain('Checking the build')
    const input = document.createElement('input')
    input.id = 'ctx-octane'
    input.scrollIntoView = () => {}
    document.body.appendChild(input)
    await alert.get('a[href="#ctx-octane"]').trigger('click')
    expect(document.activeElement).toBe(input)
    input.remove()
    wrapper.unmount()
  })

  it('shows the error over a stale verdict', () => {
    const wrapper = mountVerdict({
      evaluation: makeEvaluation({ verdict: 'fits' }),
      filledCount: 2,
      isLoading: false,
      errors: [{ field: 'head', label: 'Cylinder head', message: 'Unknown part number "TM-HD-20O0".', inputId: 'slot-head' }],
    })
    expect(wrapper.get('section').attributes('data-verdict')).toBe('error')
    expect(wrapper.text()).not.toContain('The build fits')
  })
})
