import { computed } from 'vue'
import { useColorMode } from '@vueuse/core'
import { DARK_MODE_CLASS } from '@/theme/preset'

const STORAGE_KEY = 'fitwright.colour-scheme'
type Scheme = 'light' | 'dark'

// One scheme for the whole app, started when this module is first imported (the shop floor
// and the counter often want different ones). Until someone chooses, it follows the device.
const mode = useColorMode({ storageKey: STORAGE_KEY, modes: { dark: DARK_MODE_CLASS, light: '' } })
const scheme = computed<Scheme>(() => (mode.state.value === 'dark' ? 'dark' : 'light'))

export function useColourScheme() {
  function toggle() {
    mode.value = scheme.value === 'dark' ? 'light' : 'dark'
  }
  return { scheme, toggle }
}
