import { flushPromises, mount } from '@vue/test-utils'
import { createPinia } from 'pinia'
import PrimeVue from 'primevue/config'
import { createMemoryHistory, createRouter } from 'vue-router'
import { describe, expect, it, vi } from 'vitest'
import SignInView from '@/views/SignInView.vue'

function mountView() {
  const router = createRouter({ history: createMemoryHistory(), routes: [{ path: '/:any(.*)*', component: SignInView }] })
  return mount(SignInView, { global: { plugins: [createPinia(), router, PrimeVue] }, attachTo: document.body })
}

describe('SignInView', () => {
  it('shows field messages next to the fields and sends nothing when the form is incomplete', async () => {
    const fetchSpy = vi.spyOn(globalThis, 'fetch')
    const wrapper = mountView()
    await wrapper.get('input#email').setValue('not an e-mail')
    await wrapper.get('form').trigger('submit')
    await flushPromises()
    expect(wrapper.text()).toContain('Enter a valid e-mail address.')
    expect(wrapper.text()).toContain('Enter your password.')
    expect(fetchSpy).not.toHaveBeenCalled()
    wrapper.unmount()
  })

  it('labels both inputs so they can be found by their label', () => {
    const wrapper = mountView()
    const labels = wrapper.findAll('label').map((label) => label.attributes('for'))
    expect(labels).toEqual(['email', 'password'])
    expect(wrapper.find('input#password').exists()).toBe(true)
    wrapper.unmount()
  })
})
