import { ref, watchEffect } from 'vue'
import { DARK_MODE_CLASS } from '@/theme/preset'

const STORAGE_KEY = 'fitwright.colour-scheme'
type Scheme = 'light' | 'dark'

function initialScheme(): Scheme {
  const stored = localStorage.getItem(STORAGE_KEY)
  if (stored === 'light' || stored === 'dark') return stored
  return window.matchMedia?.('(prefers-color-scheme: dark)').matches ? 'dark' : 'light'
}

// One scheme for the whole app: the shop floor and the counter often want different ones.
const scheme = ref<Scheme>(initialScheme())

// One watcher for the app, started when this module is first imported, however many components use the scheme.
watchEffect(() => {
  document.documentElement.classList.toggle(DARK_MODE_CLASS, scheme.value === 'dark')
  localStorage.setItem(STORAGE_KEY, scheme.value)
})

export function useColourScheme() {
  function toggle() {
    scheme.value = scheme.value === 'dark' ? 'light' : 'dark'
  }
  return { scheme, toggle }
}
