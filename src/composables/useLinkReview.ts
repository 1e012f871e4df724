import { ref } from 'vue'
import type { ReviewStatus } from '@shared/schemas/fitment'
import type { Link, LinkList } from '@shared/schemas/link'
import { ApiError } from '@/api/http'
import { linksApi } from '@/api/links'
import { useRemote } from './useRemote'

/**
 * The editor's review queue: links proposed from the field, approved or
 * rejected one by one, and approved links a field report found otherwise,
 * which stay as they are until an editor looks at the reports.
 */
export function useLinkReview() {
  const queue = useRemote<LinkList>()
  const contradicted = useRemote<LinkList>()
  const busyId = ref<number | null>(null)
  const actionError = ref<ApiError | null>(null)

  const load = () =>
    Promise.all([
      queue.run((signal) => linksApi.list({ status: 'proposed', pageSize: 200 }, signal)),
      contradicted.run((signal) => linksApi.list({ status: 'approved', contradicted: '1', pageSize: 200 }, signal)),
    ])

  async function review(link: Link, status: Extract<ReviewStatus, 'approved' | 'rejected'>): Promise<Link | null> {
    busyId.value = link.id
    actionError.value = null
    try {
      const updated = await linksApi.update(link.id, { status })
      await load()
      return updated
    } catch (error) {
      actionError.value = error instanceof ApiError ? error : new ApiError(0, 'client', String(error))
      return null
    } finally {
      busyId.value = null
    }
  }

  return { ...queue, contradicted, load, review, busyId, actionError }
}
