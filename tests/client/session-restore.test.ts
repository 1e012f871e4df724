import { flushPromises, mount } from '@vue/test-utils'
import { createPinia, setActivePinia } from 'pinia'
import PrimeVue from 'primevue/config'
import { afterEach, describe, expect, it, vi } from 'vitest'
import router from '@/router'
import { useSessionStore } from '@/stores/session'
import SignInView from '@/views/SignInView.vue'

const counter = { id: 3, email: 'counter@fitwright.test', name: 'Counter Person', role: 'counter', disabled: false }

function answer(status: number, body: unknown) {
  return new Response(JSON.stringify(body), { status, headers: { 'Content-Type': 'application/json' } })
}

/** The network edge: each call takes the next answer; a thrown error stands for no connection at all. */
function stubServer(...answers: (() => Response)[]) {
  const fetchMock = vi.fn(async () => {
    const next = answers.shift()
    if (!next) throw new Error('unexpected request')
    return next()
  })
  vi.stubGlobal('fetch', fetchMock)
  return fetchMock
}
const unreachable = () => {
  throw new TypeError('Failed to fetch')
}

afterEach(() => vi.unstubAllGlobals())

describe('session restore', () => {
  it('keeps a server fault as the connection error instead of throwing, and asks again on the next call', async () => {
    setActivePinia(createPinia())
    const fetchMock = stubServer(
      () => answer(500, { error: { code: 'internal', message: 'Something went wrong on the server.' } }),
      () => answer(200, counter),
    )
    const session = useSessionStore()

    await expect(session.restore()).resolves.toBeUndefined()
    expect(session.isSignedIn).toBe(false)
    expect(session.connectionError).toMatchObject({ status: 500, message: 'Something went wrong on the server.' })

    await session.restore()
    expect(fetchMock).toHaveBeenCalledTimes(2)
    expect(session.user?.name).toBe('Counter Person')
    expect(session.connectionError).toBeNull()
  })

  it('takes a 401 as signed out, with no error, and does not ask again', async () => {
    setActivePinia(createPinia())
    const fetchMock = stubServer(() => answer(401, { error: { code: 'unauthorized', message: 'Sign in first.' } }))
    const session = useSessionStore()

    await session.restore()
    await session.restore()

    expect(session.isSignedIn).toBe(false)
    expect(session.connectionError).toBeNull()
    expect(fetchMock).toHaveBeenCalledTimes(1)
  })
})

describe('first load without a connection', () => {
  it('sends the user to sign-in, says why there, and lets "Try again" continue to the page asked for', async () => {
    const pinia = createPinia()
    setActivePinia(pinia)
    const fetchMock = stubServer(unreachable, () => answer(200, counter))

    await router.push('/parts')
    expect(router.currentRoute.value.name).toBe('sign-in')
    expect(router.currentRoute.value.query.redirect).toBe('/parts')
    // The redirect to sign-in does not repeat the failed check.
    expect(fetchMock).toHaveBeenCalledTimes(1)

    const wrapper = mount(SignInView, { global: { plugins: [pinia, router, PrimeVue] } })
    const alert = wrapper.get('[role="alert"]')
    expect(alert.text()).toContain('Cannot reach the Fitwright server')

    await alert.get('button').trigger('click')
    await flushPromises()
    expect(fetchMock).toHaveBeenCalledTimes(2)
    // The page's code is loaded on first visit, so the navigation may take a moment.
    await vi.waitFor(() => expect(router.currentRoute.value.name).toBe('parts'), { timeout: 10_000 })
    wrapper.unmount()
  })

  it('checks again on the next navigation after a failed check', async () => {
    setActivePinia(createPinia())
    const fetchMock = stubServer(
      () => answer(502, null),
      () => answer(200, counter),
    )

    await router.push('/lookup')
    expect(router.currentRoute.value.name).toBe('sign-in')

    await router.push('/lookup')
    expect(fetchMock).toHaveBeenCalledTimes(2)
    expect(router.currentRoute.value.name).toBe('lookup')
  })
})
