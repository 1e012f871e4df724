import { onMounted } from 'vue'
import { useRoute } from 'vue-router'
import type { SharedView } from '@shared/schemas/shared-links'
import { ApiError } from '@/api/http'
import { sharedLinksApi } from '@/api/sharedLinks'
import { useRemote } from './useRemote'

/** The token of a mailed link: after the #, so it never reaches a server log. */
function tokenFromHash(hash: string): string {
  return new URLSearchParams(hash.replace(/^#/, '')).get('token') ?? ''
}

/** What a mailed read-only link shows: a build sheet with its verdict, or a quote; opened once on arrival. */
export function useSharedLink() {
  const route = useRoute()
  const token = tokenFromHash(route.hash)
  const shared = useRemote<SharedView>()
  const load = () =>
    shared.run((signal) => {
      if (!token) return Promise.reject(new ApiError(400, 'link_unknown', 'This link is not complete; open it again from the mail.'))
      return sharedLinksApi.open(token, signal)
    })
  onMounted(load)
  return { shared, load }
}
