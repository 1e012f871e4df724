import { useTemplateRef } from 'vue'
import type { AutoCompleteCompleteEvent } from 'primevue/autocomplete'

/**
 * PrimeVue's AutoComplete still runs a search typed just before an option was
 * clicked, after the click, and reopens its list with the answer. This tells
 * such a late search apart (its text is no longer what the input shows) and
 * closes the list it reopens. `refKey` is the AutoComplete's template ref.
 */
export function useLateSearchGuard(refKey: string, shownText: () => string) {
  const list = useTemplateRef<{ hide: () => void }>(refKey)
  let hideNextShow = false

  /** True for a late search; the caller then only settles its suggestions (the list waits for them). */
  function isLate(event: AutoCompleteCompleteEvent): boolean {
    const late = event.originalEvent.type === 'input' && event.query !== shownText()
    if (late) hideNextShow = true
    return late
  }

  function onShow() {
    if (!hideNextShow) return
    hideNextShow = false
    list.value?.hide()
  }

  /** Closes the list now and, when a search is still on its way, the list it would open. */
  function close(searchPending: boolean) {
    hideNextShow = searchPending
    list.value?.hide()
  }

  return { isLate, onShow, close }
}
