import { onBeforeUnmount, watchEffect, type Ref } from 'vue'
import { useElementSize } from '@vueuse/core'

export const TOP_BAR_HEIGHT_VAR = '--fw-top-bar-height'

/**
 * Publishes the top bar's height as a CSS variable so the toasts start below it:
 * on a tablet the bar wraps to two rows, so a fixed offset would still cover its controls.
 */
export function useTopBarClearance(bar: Ref<HTMLElement | null>) {
  const { height } = useElementSize(bar, undefined, { box: 'border-box' })
  const root = document.documentElement
  watchEffect(() => root.style.setProperty(TOP_BAR_HEIGHT_VAR, `${Math.ceil(height.value)}px`))
  onBeforeUnmount(() => root.style.removeProperty(TOP_BAR_HEIGHT_VAR))
}
