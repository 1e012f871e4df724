import { onMounted, ref, shallowRef } from 'vue'
import type { OUTBOX_STATUSES, OutboxMessage, OutboxPage } from '@shared/schemas/mail'
import { mailApi } from '@/api/mail'
import { useRemote } from './useRemote'

export type OutboxStatus = (typeof OUTBOX_STATUSES)[number]

export const OUTBOX_STATUS_LABELS: Record<OutboxStatus, string> = {
  queued: 'Waiting to go',
  sent: 'Sent',
  failed: 'Gave up',
}

/** The mail screen: one server page of the outbox at a time, newest first, optionally one status; one message open. */
export function useOutbox(pageSize = 25) {
  const remote = useRemote<OutboxPage>()
  const page = ref(1)
  const status = ref<OutboxStatus | null>(null)
  const open = shallowRef<OutboxMessage | null>(null)

  const load = () =>
    remote.run((signal) => mailApi.page({ page: page.value, pageSize, ...(status.value ? { status: status.value } : {}) }, signal))
  onMounted(load)

  /** DataTable's lazy page event counts from 0. */
  function showPage(first: number) {
    page.value = Math.floor(first / pageSize) + 1
    void load()
  }

  function showStatus(value: OutboxStatus | null) {
    status.value = value
    page.value = 1
    void load()
  }

  return { result: remote.data, isLoading: remote.isLoading, error: remote.error, page, pageSize, status, open, load, showPage, showStatus }
}
