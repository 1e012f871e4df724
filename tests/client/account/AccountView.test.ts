import { flushPromises, mount } from '@vue/test-utils'
import { createPinia } from 'pinia'
import PrimeVue from 'primevue/config'
import Select from 'primevue/select'
import Toast from 'primevue/toast'
import ToastService from 'primevue/toastservice'
import { afterEach, describe, expect, it, vi } from 'vitest'
import { defineComponent, h } from 'vue'
import AccountView from '@/views/AccountView.vue'

type Call = { path: string; body: unknown }

const SITES = [
  { id: 3, name: 'Lot B', address: '' },
  { id: 4, name: 'Main counter', address: '' },
]
const json = (body: unknown) => new Response(JSON.stringify(body), { status: 200, headers: { 'Content-Type': 'application/json' } })

/** The network edge: the password change answers `answer`; keeps what was sent. */
function stubServer(answer: () => Response) {
  const calls: Call[] = []
  document.cookie = 'fitwright-csrf=test-token'
  vi.stubGlobal('fetch', async (url: string, init: RequestInit) => {
    const path = new URL(url, 'http://fitwright.test').pathname
    // The home-site choice loads the sites on mount; only what the test sends is kept.
    if (path === '/api/sites') return json(SITES)
    calls.push({ path, body: typeof init.body === 'string' ? JSON.parse(init.body) : null })
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

describe('AccountView, choosing your home site', () => {
  const me = { id: 7, email: 'counter@fitwright.test', name: 'Counter', role: 'counter', disabled: false, invitePending: false }

  it('offers the sites and none, sends the one chosen, and shows it as yours', async () => {
    const calls = stubServer(() => json({ ...me, homeSiteId: 3 }))
    const wrapper = await mountView()
    const select = wrapper.findAllComponents(Select).find((component) => component.props('inputId') === 'home-site')!
    expect(select.props('options')).toEqual([
      { value: null, label: 'None' },
      { value: 3, label: 'Lot B' },
      { value: 4, label: 'Main counter' },
    ])
    expect(select.props('modelValue')).toBeNull()

    select.vm.$emit('update:modelValue', 3)
    await flushPromises()

    expect(calls).toEqual([{ path: '/api/account/home-site', body: { homeSiteId: 3 } }])
    expect(document.body.textContent).toContain('Home site: Lot B')
    expect(select.props('modelValue')).toBe(3)
    wrapper.unmount()
  })

  it('says in the toast when the server refuses the site, and keeps showing the one stored', async () => {
    stubServer(
      () =>
        new Response(JSON.stringify({ error: { code: 'bad_request', message: 'No site 3.' } }), {
          status: 400,
          headers: { 'Content-Type': 'application/json' },
        }),
    )
    const wrapper = await mountView()
    const select = wrapper.findAllComponents(Select).find((component) => component.props('inputId') === 'home-site')!

    select.vm.$emit('update:modelValue', 3)
    await flushPromises()

    expect(document.body.textContent).toContain('Home site not changed')
    expect(document.body.textContent).toContain('No site 3.')
    expect(select.props('modelValue')).toBeNull()
    wrapper.unmount()
  })
})
