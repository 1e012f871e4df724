import { onKeyStroke } from '@vueuse/core'

/** Whether a key press was typed into something that takes text, where `/` is just a character. */
export function isTypingTarget(target: EventTarget | null): boolean {
  if (!(target instanceof HTMLElement)) return false
  return target.isContentEditable || ['INPUT', 'TEXTAREA', 'SELECT'].includes(target.tagName)
}

/** `/` anywhere on the page puts the cursor in the element with this id (the top bar's part search). */
export function useSlashFocus(inputId: string) {
  onKeyStroke('/', (event) => {
    if (event.ctrlKey || event.metaKey || event.altKey || isTypingTarget(event.target)) return
    const input = document.getElementById(inputId)
    if (!(input instanceof HTMLInputElement)) return
    event.preventDefault()
    input.focus()
    input.select()
  })
}
