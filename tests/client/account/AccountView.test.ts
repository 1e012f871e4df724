import { flushPromises, mount } from '@vue/test-utils'
import { createPinia } from 'pinia'
import PrimeVue from 'primevue/config'
import Toast from 'primevue/toast'
import ToastService from 'primevue/toastservice'
import { afterEach, describe, expect, it, vi } from 'vitest'
import { defineComponent, h } from 'vue'
import AccountView from '@/views/AccountView.vue'

type Call = { path: string; body: unknown }

/** The network edge: the password change answers `answer`; keeps what was sent. */
function stubServer(answer: () => Response) {
  const calls: Call[] = []
  document.cookie = 'fitwright-csrf=test-token'
  vi.stubGlobal('fetch', async (url: string, init: RequestInit) => {
    calls.push({ path: new URL(url, 'http://fitwright.test').pathname, body: typeof init.body === 'string' ? JSON.parse(init.body) : null })
    return answer()
  })
  return calls
}

async function mountView() {
  const Host = defineComponent({ render: () => [h(Toast), h(AccountView)] })
  const wrapper = mount(Host, { global: { plugins: [createPinia(), PrimeVue, ToastService] }, attachTo: document.body })
  await flushPromises()
  return wrapper
}

async function fill(wrapper: Awaited<ReturnType<typeof mountView>>, current: string, next: string, repeat = next) {
  await wrapper.get('#current-password').setValue(current)
  await wrapper.get('#changed-password').setValue(next)
  await wrapper.get('#changed-password-repeat').setValue(repeat)
  await wrapper.get('form[aria-label="Change your password"]').trigger('submit')
  await flushPromises()
}

afterEach(() => {
  vi.unstubAllGlobals()
  document.body.innerHTML = ''
})

describe('AccountView, changing your own password', () => {
  it('sends nothing while the new password is short or the two differ', async () => {
    const calls = stubServer(() => new Response(null, { status: 204 }))
    const wrapper = await mountView()
    await fill(wrapper, 'fitwright-demo', 'short')
    expect(wrapper.get('#changed-password-error').text()).toBe('Use at least 10 characters.')
    await fill(wrapper, 'fitwright-demo', 'three-stage-torque-9', 'three-stage-torque-8')
    expect(wrapper.get('#changed-password-repeat-error').text()).toBe('The two passwords differ.')
    expect(calls).toEqual([])
    wrapper.unmount()
  })

  it('puts "not your current password" beside the current password', async () => {
    stubServer(
      () =>
        new Response(
          JSON.stringify({
            error: {
              code: 'bad_request',
              message: 'Your current password is not right.',
              details: [{ path: 'currentPassword', message: 'This is not your current password.' }],
            },
          }),
          { status: 400, headers: { 'Content-Type': 'application/json' } },
        ),
    )
    const wrapper = await mountView()
    await fill(wrapper, 'a-wrong-guess', 'three-stage-torque-9')
    expect(wrapper.get('#current-password-error').text()).toBe('This is not your current password.')
    wrapper.unmount()
  })

  it('changes it, says the other sessions are signed out, and clears the form', async () => {
    const calls = stubServer(() => new Response(null, { status: 204 }))
    const wrapper = await mountView()
    await fill(wrapper, 'fitwright-demo', 'three-stage-torque-9')
    expect(calls).toEqual([
      { path: '/api/auth/change-password', body: { currentPassword: 'fitwright-demo', password: 'three-stage-torque-9' } },
    ])
    expect(document.body.textContent).toContain('your other sessions are signed out')
    expect((wrapper.get('#current-password').element as HTMLInputElement).value).toBe('')
    wrapper.unmount()
  })
})
