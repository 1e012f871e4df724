import { flushPromises, mount } from '@vue/test-utils'
import PrimeVue from 'primevue/config'
import Toast from 'primevue/toast'
import ToastService from 'primevue/toastservice'
import { afterEach, describe, expect, it } from 'vitest'
import { defineComponent, h } from 'vue'
import { ApiError } from '@/api/http'
import { failureMessage, useNotify } from '@/composables/useNotify'
import AppRemoteState from '@/components/app/AppRemoteState.vue'

type Notify = ReturnType<typeof useNotify>

/** A screen that notifies, mounted beside the app's one Toast as the layout does. */
function mountWithToast(act: (notify: Notify) => void) {
  const Screen = defineComponent({
    setup() {
      const notify = useNotify()
      return () => h('button', { onClick: () => act(notify) }, 'Act')
    },
  })
  const Host = defineComponent({ render: () => [h(Toast, { class: 'fw-toast' }), h(Screen)] })
  return mount(Host, { global: { plugins: [PrimeVue, ToastService] }, attachTo: document.body })
}

afterEach(() => {
  document.body.innerHTML = ''
})

describe('useNotify', () => {
  it('shows a failure with the server message under its summary', async () => {
    const wrapper = mountWithToast((notify) => notify.failure('Not deleted', new ApiError(409, 'conflict', 'The sheet changed meanwhile.')))
    await wrapper.get('button').trigger('click')
    await flushPromises()
    const alert = document.body.querySelector('[role="alert"]')
    expect(alert?.textContent).toContain('Not deleted')
    expect(alert?.textContent).toContain('The sheet changed meanwhile.')
  })

  it('shows a success with its detail', async () => {
    const wrapper = mountWithToast((notify) => notify.success('Saved “Race head”', 'Find it again under Build sheets.'))
    await wrapper.get('button').trigger('click')
    await flushPromises()
    expect(document.body.querySelector('.p-toast-message-success')?.textContent).toContain('Find it again under Build sheets.')
  })

  it.each([
    [new ApiError(403, 'forbidden', 'You may not change your own role.'), 'You may not change your own role.'],
    [new Error('Network down'), 'Network down'],
    ['a thrown string', 'Something went wrong. Try again.'],
  ])('says why it failed: %s → %s', (error, expected) => {
    expect(failureMessage(error)).toBe(expected)
  })
})

describe('AppRemoteState while loading', () => {
  it('announces its loading text with the spinner in the same status line', () => {
    const wrapper = mount(AppRemoteState, {
      props: { isLoading: true, error: null, loadingText: 'Loading the graph…' },
      global: { plugins: [PrimeVue] },
    })
    const status = wrapper.get('[role="status"]')
    expect(status.text()).toBe('Loading the graph…')
    expect(status.find('.p-progressspinner').exists()).toBe(true)
  })
})
