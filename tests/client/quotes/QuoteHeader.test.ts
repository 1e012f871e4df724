import { mount } from '@vue/test-utils'
import { describe, expect, it } from 'vitest'
import type { Quote } from '@shared/schemas/quotes'
import QuoteHeader from '@/components/quotes/QuoteHeader.vue'

function quote(vehicle: Quote['vehicle']): Quote {
  return {
    id: 12,
    status: 'draft',
    customer: 'R. Okafor',
    buildSheetId: null,
    buildName: null,
    shop: {
      name: 'Fitwright demo shop',
      address: '',
      labourRateCents: 6500,
      taxRateBasisPoints: 2000,
      currency: 'EUR',
      baseMinutesPerGroup: 45,
      reservationHours: 72,
    },
    vehicle,
    lines: [],
    totals: { partsCents: 0, labourCents: 0, coreCents: 0, taxCents: 0, totalCents: 0 },
    cautions: [],
    createdBy: 'Tech',
    createdAt: '2026-03-04T09:05:00.000Z',
    reservedUntil: null,
  }
}

describe('QuoteHeader, the vehicle', () => {
  it('prints make, model and engine family beside the model year and VIN', () => {
    const wrapper = mount(QuoteHeader, {
      props: { quote: quote({ modelYear: 1994, vin: 'TMWVL3414R1234567', make: 'Talmark', model: 'Vell', engineFamily: 'TK20V' }) },
    })
    expect(wrapper.get('.vehicle-name').text()).toBe('Talmark Vell, TK20V engine')
    expect(wrapper.text()).toContain('1994')
    expect(wrapper.text()).toContain('TMWVL3414R1234567')
  })

  it('prints the make alone when the model is not known, and no vehicle line for a quote without one', () => {
    const makeOnly = mount(QuoteHeader, {
      props: { quote: quote({ modelYear: null, vin: 'TMWVL3414R1234567', make: 'Talmark', model: null, engineFamily: null }) },
    })
    expect(makeOnly.get('.vehicle-name').text()).toBe('Talmark')
    const older = mount(QuoteHeader, {
      props: { quote: quote({ modelYear: 1994, vin: null, make: null, model: null, engineFamily: null }) },
    })
    expect(older.find('.vehicle-name').exists()).toBe(false)
    expect(older.text()).toContain('Vehicle model year')
  })
})
