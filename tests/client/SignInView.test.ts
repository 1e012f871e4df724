import { flushPromises, mount } from '@vue/test-utils'
import { createPinia } from 'pinia'
import PrimeVue from 'primevue/config'
import { createMemoryHistory, createRouter } from 'vue-router'
import { describe, expect, it, vi } from 'vitest'
import SignInView from '@/views/SignInView.vue'

function testRouter() {
  return createRouter({
    history: createMemoryHistory(),
    routes: [
      { path: '/forgot-password', name: 'forgot-password', component: SignInView },
      { path: '/:any(.*)*', component: SignInView },
    ],
  })
}

function mountView(router = testRouter()) {
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

  it('comes back from a mailed link with the e-mail filled in and says the password is set', async () => {
    const router = testRouter()
    await router.push('/sign-in?email=tech%40fitwright.test&notice=password-set')
    const wrapper = mountView(router)
    await flushPromises()
    expect((wrapper.get('input#email').element as HTMLInputElement).value).toBe('tech@fitwright.test')
    expect(wrapper.get('[role="status"]').text()).toContain('Your password is set')
    wrapper.unmount()
  })

  it('links to "Forgot password" carrying the e-mail typed so far', async () => {
    const router = testRouter()
    await router.push('/sign-in')
    const wrapper = mountView(router)
    await wrapper.get('input#email').setValue('counter@fitwright.test')
    const link = wrapper.findAll('a').find((a) => a.text() === 'Forgot password?')
    expect(link?.attributes('href')).toBe('/forgot-password?email=counter@fitwright.test')
    wrapper.unmount()
  })
})
