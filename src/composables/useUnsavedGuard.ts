import type { Ref } from 'vue'
import { onBeforeRouteLeave } from 'vue-router'
import { useEventListener } from '@vueuse/core'
import { useConfirm } from 'primevue/useconfirm'

/**
 * Leaving the planner with unsaved changes asks first: another screen through
 * the app's own dialog, closing or reloading the tab through the browser's.
 * Moving within the planner (a slot change, saving as a new sheet) is not leaving.
 */
export function useUnsavedGuard(isDirty: Readonly<Ref<boolean>>, stayRoutes: ReadonlySet<string>) {
  const confirm = useConfirm()

  onBeforeRouteLeave((to) => {
    if (!isDirty.value || stayRoutes.has(String(to.name))) return true
    return new Promise<boolean>((resolve) => {
      confirm.require({
        header: 'Leave without saving?',
        message: 'This build sheet has unsaved changes (parts, context or checklist ticks). Leave and lose them?',
        icon: 'pi pi-exclamation-triangle',
        acceptProps: { label: 'Leave without saving', severity: 'danger' },
        rejectProps: { label: 'Stay', outlined: true },
        accept: () => resolve(true),
        reject: () => resolve(false),
        onHide: () => resolve(false),
      })
    })
  })

  useEventListener(window, 'beforeunload', (event: BeforeUnloadEvent) => {
    if (!isDirty.value) return
    event.preventDefault()
    // Older browsers show the dialog only when returnValue is set.
    event.returnValue = ''
  })
}
