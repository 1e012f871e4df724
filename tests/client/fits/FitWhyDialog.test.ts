import { createPinia } from 'pinia'
import { mount } from '@vue/test-utils'
import PrimeVue from 'primevue/config'
import { describe, expect, it } from 'vitest'
import FitWhyDialog from '@/components/fits/FitWhyDialog.vue'
import type { FitResult } from '@shared/schemas/fitment'
import { NO_STOCK } from '@shared/schemas/stock'
import { makePart } from '../../helpers/client-factories'

describe('FitWhyDialog', () => {
  it('leads with the rule that decided a does-not-fit answer, not the first passing one', () => {
    const result: FitResult = {
      part: makePart('TM-HG-1800', 'head-gasket'),
      relation: 'does-not-fit',
      decidedBy: 'rule',
      review: 'inferred',
      ruleIds: ['head-bolt-pattern', 'head-gasket-bore'],
      modifications: [],
      explanation: [
        { type: 'rule', relation: 'fits', text: 'Gasket bolt pattern P10-A matches the block.' },
        { type: 'rule', relation: 'does-not-fit', text: 'Gasket bore 84.5 mm is smaller than the 86 mm cylinder bore.' },
      ],
      fieldReports: { confirmed: 0, contradicted: 0 },
      stock: { ...NO_STOCK },
    }
    const wrapper = mount(FitWhyDialog, {
      props: { result, from: 'TM-BL-2000' },
      global: { plugins: [PrimeVue, createPinia()], stubs: { Dialog: { template: '<div><slot /></div>' } } },
    })
    expect(wrapper.get('.decided').text()).toBe('What decided: Gasket bore 84.5 mm is smaller than the 86 mm cylinder bore.')
  })
})
