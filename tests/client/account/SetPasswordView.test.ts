import { flushPromises, mount } from '@vue/test-utils'
import PrimeVue from 'primevue/config'
import { createMemoryHistory, createRouter } from 'vue-router'
import { afterEach, describe, expect, it, vi } from 'vitest'
import { defineComponent, h } from 'vue'
import SetPasswordView from '@/views/SetPasswordView.vue'

const TOKEN = 'a'.repeat(43)
const json = (status: number, body: unknown) =>
  new Response(JSON.stringify(body), { status, headers: { 'Content-Type': 'application/json' } })

type Call = { path: string; body: unknown }

/** The network edge: the link check answers `link`, setting the password answers `set`. */
function stubServer(link: () => Response, set: () => Response = () => json(200, { email: 'tech@fitwright.test' })) {
  const calls: Call[] = []
  document.cookie = 'fitwright-csrf=test-token'
  vi.stubGlobal('fetch', async (url: string, init: RequestInit) => {
    const path = new URL(url, 'http://fitwright.test').pathname
    calls.push({ path, body: typeof init.body === 'string' ? JSON.parse(init.body) : null })
    return path === '/api/auth/password-link' ? link() : set()
  })
  return calls
}

async function mountAt(address: string) {
  const Stub = defineComponent({ render: () => h('p', 'signed-in page') })
  const router = createRouter({
    history: createMemoryHistory(),
    routes: [
      { path: '/set-password', component: SetPasswordView },
      { path: '/sign-in', name: 'sign-in', component: Stub },
      { path: '/forgot-password', name: 'forgot-password', component: Stub },
    ],
  })
  await router.push(address)
  const wrapper = mount(SetPasswordView, { global: { plugins: [router, PrimeVue] }, attachTo: document.body })
  await flushPromises()
  return { wrapper, router }
}

afterEach(() => {
  vi.unstubAllGlobals()
  document.body.innerHTML = ''
})

describe('SetPasswordView', () => {
  it('says a spent link is spent before anyone types, and offers a new one', async () => {
    stubServer(() =>
      json(400, { error: { code: 'link_unusable', message: 'This link has expired or was used already. Ask for a new one.' } }),
    )
    const { wrapper } = await mountAt(`/set-password#token=${TOKEN}`)
    expect(wrapper.get('[role="alert"]').text()).toContain('expired or was used already')
    expect(wrapper.find('form').exists()).toBe(false)
    expect(wrapper.findAll('a').map((a) => a.text())).toContain('Mail me a new link')
  })

  it('says a link without its token is not complete, asking the server nothing', async () => {
    const calls = stubServer(() => json(500, {}))
    const { wrapper } = await mountAt('/set-password')
    expect(wrapper.get('[role="alert"]').text()).toContain('not complete')
    expect(calls).toEqual([])
  })

  it('greets an invited user, refuses two different passwords, then sets it and goes to sign-in with the e-mail', async () => {
    const calls = stubServer(() => json(200, { purpose: 'invite', email: 'tech@fitwright.test', name: 'Dario Lenk' }))
    const { wrapper, router } = await mountAt(`/set-password#token=${TOKEN}`)
    expect(wrapper.get('h1').text()).toBe('Choose your password')
    expect(wrapper.text()).toContain('Welcome, Dario Lenk. You sign in as tech@fitwright.test.')
    await wrapper.get('#new-password').setValue('three-stage-torque-9')
    await wrapper.get('#repeat-password').setValue('three-stage-torque-8')
    await wrapper.get('form').trigger('submit')
    await flushPromises()
    expect(wrapper.get('#repeat-password-error').text()).toBe('The two passwords differ.')
    expect(calls.map((call) => call.path)).toEqual(['/api/auth/password-link'])

    await wrapper.get('#repeat-password').setValue('three-stage-torque-9')
    await wrapper.get('form').trigger('submit')
    await flushPromises()
    expect(calls[1]).toEqual({ path: '/api/auth/set-password', body: { token: TOKEN, password: 'three-stage-torque-9' } })
    expect(router.currentRoute.value.path).toBe('/sign-in')
    expect(router.currentRoute.value.query).toEqual({ email: 'tech@fitwright.test', notice: 'password-set' })
  })

  it("puts the server's refusal of a common password beside the field", async () => {
    stubServer(
      () => json(200, { purpose: 'reset', email: 'tech@fitwright.test', name: 'Dario Lenk' }),
      () =>
        json(400, {
          error: {
            code: 'bad_request',
            message: 'Choose a less common password.',
            details: [{ path: 'password', message: 'This password is on a list of common passwords; choose another.' }],
          },
        }),
    )
    const { wrapper } = await mountAt(`/set-password#token=${TOKEN}`)
    expect(wrapper.get('h1').text()).toBe('Choose a new password')
    await wrapper.get('#new-password').setValue('password1234')
    await wrapper.get('#repeat-password').setValue('password1234')
    await wrapper.get('form').trigger('submit')
    await flushPromises()
    expect(wrapper.get('#new-password-error').text()).toContain('list of common passwords')
  })
})
