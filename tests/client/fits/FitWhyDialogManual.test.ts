import { createPinia } from 'pinia'
import { mount } from '@vue/test-utils'
import PrimeVue from 'primevue/config'
import { describe, expect, it } from 'vitest'
import FitWhyDialog from '@/components/fits/FitWhyDialog.vue'
import type { FitResult } from '@shared/schemas/fitment'
import { NO_STOCK } from '@shared/schemas/stock'
import { makePart } from '../../helpers/client-factories'

describe('FitWhyDialog and the service manual', () => {
  it("shows the manual section beside a modification's caution and beside a rule's caution, and none where none is named", () => {
    const result: FitResult = {
      part: makePart('TM-DS-2000', 'distributor'),
      relation: 'fits-with-modification',
      decidedBy: 'rule',
      review: 'inferred',
      ruleIds: ['distributor-mount'],
      modifications: [
        {
          name: 'distributor-internals-transfer',
          title: 'Move the internals',
          summary: 'Into a housing with the head flange.',
          steps: ['Lift the internals out.'],
          extraParts: [],
          consumables: [],
          skillLevel: 'skilled',
          timeMinutes: 60,
          cautions: [
            { text: 'An offset drive tang fits one way round.', manual: 'distributor removal, drive tang and base timing' },
            'Plain caution.',
          ],
          status: 'approved',
        },
      ],
      explanation: [
        { type: 'rule', relation: 'fits-with-modification', text: 'Flange DM-2S does not bolt to DM-3.' },
        { type: 'note', text: 'Measure the drive dog engagement.', manual: 'distributor removal and base timing' },
      ],
      fieldReports: { confirmed: 0, contradicted: 0 },
      stock: { ...NO_STOCK },
    }
    const wrapper = mount(FitWhyDialog, {
      props: { result, from: 'TM-HD-1800' },
      global: { plugins: [PrimeVue, createPinia()], stubs: { Dialog: { template: '<div><slot /></div>' } } },
    })
    const cautions = wrapper.get('ul.cautions').findAll('li')
    expect(cautions[0]!.text()).toContain('An offset drive tang fits one way round.')
    expect(cautions[0]!.get('.manual').text()).toBe('Service manual: distributor removal, drive tang and base timing')
    expect(cautions[1]!.text()).toContain('Plain caution.')
    expect(cautions[1]!.find('.manual').exists()).toBe(false)
    const steps = wrapper.get('.fit-explanation').findAll('li')
    expect(steps[1]!.get('.manual').text()).toBe('Service manual: distributor removal and base timing')
    expect(steps[0]!.find('.manual').exists()).toBe(false)
  })
})
