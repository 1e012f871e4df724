import { flushPromises, mount } from '@vue/test-utils'
import PrimeVue from 'primevue/config'
import ConfirmDialog from 'primevue/confirmdialog'
import ConfirmationService from 'primevue/confirmationservice'
import Select from 'primevue/select'
import Toast from 'primevue/toast'
import ToastService from 'primevue/toastservice'
import { afterEach, describe, expect, it, vi } from 'vitest'
import { defineComponent, h } from 'vue'
import UsersView from '@/views/UsersView.vue'

const admin = { id: 1, email: 'admin@fitwright.test', name: 'Admin Person', role: 'admin', disabled: false }

type Call = { method: string; path: string; body: unknown }

/** The network edge: answers GET /api/users with the list and POST with `onCreate`; keeps what was sent. */
function stubServer(onCreate: () => Response) {
  const calls: Call[] = []
  vi.stubGlobal('fetch', async (url: string, init: RequestInit) => {
    const method = init.method ?? 'GET'
    const path = new URL(url, 'http://fitwright.test').pathname
    calls.push({ method, path, body: typeof init.body === 'string' ? JSON.parse(init.body) : null })
    if (method === 'POST') return onCreate()
    return new Response(JSON.stringify([admin]), { status: 200, headers: { 'Content-Type': 'application/json' } })
  })
  return calls
}

function errorAnswer(status: number, code: string, message: string, details?: { path: string; message: string }[]) {
  return new Response(JSON.stringify({ error: { code, message, details } }), { status, headers: { 'Content-Type': 'application/json' } })
}

/** The view as the layout shows it: with the app's one Toast beside it. */
async function mountView() {
  const Host = defineComponent({ render: () => [h(Toast), h(UsersView)] })
  const wrapper = mount(Host, {
    global: { plugins: [PrimeVue, ToastService, ConfirmationService], stubs: { DataTable: true, Column: true } },
    attachTo: document.body,
  })
  await flushPromises()
  return wrapper
}

async function addUser(wrapper: Awaited<ReturnType<typeof mountView>>) {
  await wrapper.get('#new-user-email').setValue('new.tech@fitwright.test')
  await wrapper.get('#new-user-name').setValue('New Tech')
  await wrapper.get('form[aria-label="Invite a user"]').trigger('submit')
  await flushPromises()
}

afterEach(() => {
  vi.unstubAllGlobals()
  document.body.innerHTML = ''
})

describe('UsersView, inviting a user', () => {
  it('says in the toast that the user was not invited when the server cannot be reached, and keeps the form filled', async () => {
    const calls = stubServer(() => {
      throw new TypeError('Failed to fetch')
    })
    const wrapper = await mountView()

    await addUser(wrapper)

    expect(calls.filter((call) => call.method === 'POST')).toHaveLength(1)
    expect(document.body.textContent).toContain('User not invited')
    expect(document.body.textContent).toContain('Cannot reach the Fitwright server')
    expect((wrapper.get('#new-user-email').element as HTMLInputElement).value).toBe('new.tech@fitwright.test')
    wrapper.unmount()
  })

  it('says a server fault in the toast', async () => {
    stubServer(() => errorAnswer(500, 'internal', 'Something went wrong on the server.'))
    const wrapper = await mountView()

    await addUser(wrapper)

    expect(document.body.textContent).toContain('Something went wrong on the server.')
    wrapper.unmount()
  })

  it("puts the server's field message next to its field and nothing in the toast", async () => {
    stubServer(() =>
      errorAnswer(409, 'conflict', 'A user with e-mail new.tech@fitwright.test exists already.', [
        { path: 'email', message: 'This e-mail is taken.' },
      ]),
    )
    const wrapper = await mountView()

    await addUser(wrapper)

    expect(wrapper.get('#new-user-email-error').text()).toBe('This e-mail is taken.')
    expect(document.body.textContent).not.toContain('User not invited')
    wrapper.unmount()
  })

  it('shows field messages and sends nothing when the form is incomplete', async () => {
    const calls = stubServer(() => errorAnswer(500, 'internal', 'not expected'))
    const wrapper = await mountView()

    await wrapper.get('form[aria-label="Invite a user"]').trigger('submit')
    await flushPromises()

    expect(wrapper.get('#new-user-email-error').text()).toBe('Enter a valid e-mail address.')
    expect(wrapper.get('#new-user-name-error').text()).toBe('Name is required.')
    expect(calls.filter((call) => call.method === 'POST')).toHaveLength(0)
    wrapper.unmount()
  })

  it('invites the user, says so, clears the form and loads the list again', async () => {
    const created = { id: 9, email: 'new.tech@fitwright.test', name: 'New Tech', role: 'counter', disabled: false }
    const calls = stubServer(() => new Response(JSON.stringify(created), { status: 201, headers: { 'Content-Type': 'application/json' } }))
    const wrapper = await mountView()

    await addUser(wrapper)

    const post = calls.find((call) => call.method === 'POST')
    expect(post?.path).toBe('/api/users/invite')
    expect(post?.body).toEqual({ email: 'new.tech@fitwright.test', name: 'New Tech', role: 'counter' })
    expect(document.body.textContent).toContain('Invitation sent to New Tech')
    expect((wrapper.get('#new-user-email').element as HTMLInputElement).value).toBe('')
    expect(calls.filter((call) => call.method === 'GET' && call.path === '/api/users')).toHaveLength(2)
    wrapper.unmount()
  })
})

describe('UsersView, changing a role', () => {
  const tech = { id: 2, email: 'tech@fitwright.test', name: 'Tech Person', role: 'tech', disabled: false }

  /** GET answers the stored list; PATCH answers `onUpdate` and, when it succeeds, changes the stored role. */
  function stubUsers(onUpdate: () => Response) {
    let stored = [admin, tech]
    const patches: unknown[] = []
    vi.stubGlobal('fetch', async (url: string, init: RequestInit) => {
      if (init.method === 'PATCH') {
        const body = JSON.parse(String(init.body)) as { role?: string; disabled?: boolean }
        patches.push(body)
        const answer = onUpdate()
        if (answer.ok) stored = stored.map((user) => (url.endsWith(`/${user.id}`) ? { ...user, ...body } : user))
        return answer
      }
      return new Response(JSON.stringify(stored), { status: 200, headers: { 'Content-Type': 'application/json' } })
    })
    return patches
  }

  async function mountWithDialogs() {
    const Host = defineComponent({ render: () => [h(Toast), h(ConfirmDialog), h(UsersView)] })
    const wrapper = mount(Host, { global: { plugins: [PrimeVue, ToastService, ConfirmationService] }, attachTo: document.body })
    await flushPromises()
    return wrapper
  }

  const roleSelect = (wrapper: Awaited<ReturnType<typeof mountWithDialogs>>, name: string) =>
    wrapper
      .findAllComponents(Select)
      .find((select) => select.attributes('aria-label') === `Role of ${name}` || select.props('ariaLabel') === `Role of ${name}`)!

  async function chooseRole(wrapper: Awaited<ReturnType<typeof mountWithDialogs>>, name: string, role: string) {
    roleSelect(wrapper, name).vm.$emit('update:modelValue', role)
    await flushPromises()
  }

  const dialogButton = (label: string) =>
    [...document.body.querySelectorAll<HTMLButtonElement>('[role="alertdialog"] button')].find(
      (button) => button.textContent?.trim() === label,
    )

  it('asks before changing a role and changes nothing when kept', async () => {
    const patches = stubUsers(() => new Response('{}', { status: 200 }))
    const wrapper = await mountWithDialogs()

    await chooseRole(wrapper, 'Tech Person', 'editor')
    expect(document.body.querySelector('[role="alertdialog"]')?.textContent).toContain('Make Tech Person Catalogue editor?')
    dialogButton('Keep Technician')!.click()
    await flushPromises()

    expect(patches).toEqual([])
    expect(roleSelect(wrapper, 'Tech Person').props('modelValue')).toBe('tech')
    wrapper.unmount()
  })

  it('shows a refused change and puts the select back to the stored role', async () => {
    const patches = stubUsers(() => errorAnswer(409, 'conflict', 'You cannot take the administrator role from yourself.'))
    const wrapper = await mountWithDialogs()

    await chooseRole(wrapper, 'Admin Person', 'counter')
    // While asked and saved, the select shows the role chosen.
    expect(roleSelect(wrapper, 'Admin Person').text()).toContain('Parts counter')
    dialogButton('Make Parts counter')!.click()
    await flushPromises()

    expect(patches).toEqual([{ role: 'counter' }])
    expect(document.body.textContent).toContain('Role not changed')
    expect(document.body.textContent).toContain('You cannot take the administrator role from yourself.')
    expect(roleSelect(wrapper, 'Admin Person').props('modelValue')).toBe('admin')
    expect(roleSelect(wrapper, 'Admin Person').text()).toContain('Administrator')
    wrapper.unmount()
  })

  it('changes the role once confirmed and says so', async () => {
    const user = { ...tech, role: 'editor' }
    stubUsers(() => new Response(JSON.stringify(user), { status: 200, headers: { 'Content-Type': 'application/json' } }))
    const wrapper = await mountWithDialogs()

    await chooseRole(wrapper, 'Tech Person', 'editor')
    dialogButton('Make Catalogue editor')!.click()
    await flushPromises()

    expect(document.body.textContent).toContain('Tech Person is now Catalogue editor')
    expect(roleSelect(wrapper, 'Tech Person').props('modelValue')).toBe('editor')
    wrapper.unmount()
  })

  const pageButton = (label: string) =>
    [...document.body.querySelectorAll<HTMLButtonElement>('button')].find((button) => button.getAttribute('aria-label') === label)

  it('disables a user only once confirmed, then shows the account as disabled with Enable', async () => {
    const patches = stubUsers(
      () => new Response(JSON.stringify({ ...tech, disabled: true }), { status: 200, headers: { 'Content-Type': 'application/json' } }),
    )
    const wrapper = await mountWithDialogs()

    pageButton('Disable Tech Person')!.click()
    await flushPromises()
    expect(document.body.querySelector('[role="alertdialog"]')?.textContent).toContain('signed out everywhere')
    expect(patches).toEqual([])
    dialogButton('Disable')!.click()
    await flushPromises()

    expect(patches).toEqual([{ disabled: true }])
    expect(document.body.textContent).toContain('Tech Person is disabled')
    expect(pageButton('Enable Tech Person')).toBeDefined()
    wrapper.unmount()
  })

  it('sends nothing when disabling is cancelled', async () => {
    const patches = stubUsers(() => new Response('{}', { status: 200 }))
    const wrapper = await mountWithDialogs()

    pageButton('Disable Tech Person')!.click()
    await flushPromises()
    dialogButton('Cancel')!.click()
    await flushPromises()

    expect(patches).toEqual([])
    expect(pageButton('Disable Tech Person')).toBeDefined()
    wrapper.unmount()
  })
})

describe('UsersView, setting a home site', () => {
  const tech = { id: 2, email: 'tech@fitwright.test', name: 'Tech Person', role: 'tech', disabled: false, homeSiteId: null }
  const sites = [{ id: 3, name: 'Lot B', address: '' }]

  /** Answers the sites, the stored users, and PATCH with `onUpdate`, storing the change when it succeeds. */
  function stubUsers(onUpdate: () => Response) {
    let stored = [admin, tech]
    const patches: unknown[] = []
    vi.stubGlobal('fetch', async (url: string, init: RequestInit) => {
      const json = (body: unknown) => new Response(JSON.stringify(body), { status: 200, headers: { 'Content-Type': 'application/json' } })
      if (url.includes('/api/sites')) return json(sites)
      if (init.method === 'PATCH') {
        const body = JSON.parse(String(init.body)) as { homeSiteId?: number | null }
        patches.push(body)
        const answer = onUpdate()
        if (answer.ok) stored = stored.map((user) => (url.endsWith(`/${user.id}`) ? { ...user, ...body } : user))
        return answer
      }
      return json(stored)
    })
    return patches
  }

  async function mountTable() {
    const Host = defineComponent({ render: () => [h(Toast), h(UsersView)] })
    const wrapper = mount(Host, { global: { plugins: [PrimeVue, ToastService, ConfirmationService] }, attachTo: document.body })
    await flushPromises()
    return wrapper
  }

  const homeSelect = (wrapper: Awaited<ReturnType<typeof mountTable>>, name: string) =>
    wrapper.findAllComponents(Select).find((select) => select.props('ariaLabel') === `Home site of ${name}`)!

  it('sends the site chosen for a user, says so, and shows it from the list loaded again', async () => {
    const patches = stubUsers(
      () => new Response(JSON.stringify({ ...tech, homeSiteId: 3 }), { status: 200, headers: { 'Content-Type': 'application/json' } }),
    )
    const wrapper = await mountTable()
    expect(homeSelect(wrapper, 'Tech Person').props('options')).toEqual([
      { value: null, label: 'None' },
      { value: 3, label: 'Lot B' },
    ])

    homeSelect(wrapper, 'Tech Person').vm.$emit('update:modelValue', 3)
    await flushPromises()

    expect(patches).toEqual([{ homeSiteId: 3 }])
    expect(document.body.textContent).toContain('Home site of Tech Person: Lot B')
    expect(homeSelect(wrapper, 'Tech Person').props('modelValue')).toBe(3)
    wrapper.unmount()
  })

  it('says a refused change in the toast and keeps the stored site', async () => {
    stubUsers(() => errorAnswer(400, 'bad_request', 'No site 3.'))
    const wrapper = await mountTable()

    homeSelect(wrapper, 'Tech Person').vm.$emit('update:modelValue', 3)
    await flushPromises()

    expect(document.body.textContent).toContain('Home site not changed')
    expect(homeSelect(wrapper, 'Tech Person').props('modelValue')).toBeNull()
    wrapper.unmount()
  })
})
