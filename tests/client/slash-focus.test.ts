import { mount } from '@vue/test-utils'
import { defineComponent, h } from 'vue'
import { afterEach, describe, expect, it } from 'vitest'
import { useSlashFocus } from '@/composables/useSlashFocus'

const Page = defineComponent({
  setup() {
    useSlashFocus('top-search')
    return () => h('div', [h('input', { id: 'top-search', value: 'TM-HD-2000' }), h('textarea', { id: 'notes' })])
  },
})

let wrapper: ReturnType<typeof mount> | null = null
afterEach(() => wrapper?.unmount())

const press = (target: EventTarget) => {
  const event = new KeyboardEvent('keydown', { key: '/', bubbles: true, cancelable: true })
  target.dispatchEvent(event)
  return event
}

describe('useSlashFocus', () => {
  it('puts the cursor in the search box when / is pressed outside any text box, and keeps the / out of it', () => {
    wrapper = mount(Page, { attachTo: document.body })
    const event = press(document.body)
    expect(document.activeElement?.id).toBe('top-search')
    expect(event.defaultPrevented).toBe(true)
  })

  it('leaves a / typed in another text box alone', () => {
    wrapper = mount(Page, { attachTo: document.body })
    const notes = document.getElementById('notes')!
    notes.focus()
    const event = press(notes)
    expect(document.activeElement?.id).toBe('notes')
    expect(event.defaultPrevented).toBe(false)
  })
})
