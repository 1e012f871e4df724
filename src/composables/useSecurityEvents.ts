import { onMounted, ref } from 'vue'
import type { SecurityEventKind, SecurityEventPage } from '@shared/schemas/security-events'
import { securityEventsApi } from '@/api/securityEvents'
import { useRemote } from './useRemote'

export const SECURITY_EVENT_LABELS: Record<SecurityEventKind, string> = {
  sign_in: 'Signed in',
  sign_in_failed: 'Failed sign-in',
  password_change: 'Password changed',
  role_change: 'Role changed',
  disable: 'Account disabled',
  enable: 'Account enabled',
  invite: 'User invited',
  password_reset_request: 'Password reset asked for',
  password_reset: 'Password set from a mailed link',
  import: 'Import committed',
  revert: 'Import reverted',
}

/** The security events screen: one server page at a time, newest first, optionally one kind. */
export function useSecurityEvents(pageSize = 50) {
  const remote = useRemote<SecurityEventPage>()
  const page = ref(1)
  const kind = ref<SecurityEventKind | null>(null)

  const load = () =>
    remote.run((signal) => securityEventsApi.page({ page: page.value, pageSize, ...(kind.value ? { kind: kind.value } : {}) }, signal))
  onMounted(load)

  /** DataTable's lazy page event counts from 0. */
  function showPage(first: number) {
    page.value = Math.floor(first / pageSize) + 1
    void load()
  }

  function showKind(value: SecurityEventKind | null) {
    kind.value = value
    page.value = 1
    void load()
  }

  return { result: remote.data, isLoading: remote.isLoading, error: remote.error, page, pageSize, kind, showPage, showKind }
}
