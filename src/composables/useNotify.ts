import { useToast } from 'primevue/usetoast'
import { ApiError } from '@/api/http'

/** How long a toast stays: a failure stays long enough to read the reason and act on it. */
const LIFE = { success: 4000, info: 6000, error: 8000 } as const

export type Notice = { severity: 'success' | 'info'; summary: string; detail?: string }

/** What a failure says: the server's own message, or a plain line for anything unexpected. */
export function failureMessage(error: unknown): string {
  if (error instanceof ApiError) return error.message
  if (error instanceof Error && error.message) return error.message
  return 'Something went wrong. Try again.'
}

/**
 * The one way a screen tells the user that something worked or failed and is not
 * a field's own error (that sits beside the field). All toasts go to the layout's single Toast.
 */
export function useNotify() {
  const toast = useToast()
  return {
    success(summary: string, detail?: string) {
      toast.add({ severity: 'success', summary, detail, life: LIFE.success })
    },
    notice(notice: Notice) {
      toast.add({ ...notice, life: LIFE[notice.severity] })
    },
    failure(summary: string, error: unknown) {
      toast.add({ severity: 'error', summary, detail: failureMessage(error), life: LIFE.error })
    },
  }
}
