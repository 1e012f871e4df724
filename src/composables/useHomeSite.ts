import { computed, onMounted, ref } from 'vue'
import type { Site } from '@shared/schemas/stock'
import { accountsApi } from '@/api/accounts'
import { stockApi } from '@/api/stock'
import { useSessionStore } from '@/stores/session'
import { useNotify } from './useNotify'
import { useRemote } from './useRemote'

/** One's own home site on the account screen: stock answers name it first, and the parts list takes its units first. */
export function useHomeSite() {
  const session = useSessionStore()
  const notify = useNotify()
  const sites = useRemote<Site[]>()
  const isSaving = ref(false)
  const options = computed(() => [
    { value: null, label: 'None' },
    ...(sites.data.value ?? []).map((site) => ({ value: site.id as number | null, label: site.name })),
  ])
  const homeSiteId = computed(() => session.user?.homeSiteId ?? null)

  onMounted(() => sites.run((signal) => stockApi.sites(signal)))

  async function choose(siteId: number | null) {
    isSaving.value = true
    try {
      const user = await accountsApi.setHomeSite(siteId)
      session.user = user
      const name = options.value.find((option) => option.value === siteId)?.label
      notify.success(siteId === null ? 'No home site' : `Home site: ${name}`)
    } catch (error) {
      notify.failure('Home site not changed', error)
    } finally {
      isSaving.value = false
    }
  }

  return { options, homeSiteId, isLoading: sites.isLoading, error: sites.error, isSaving, choose }
}
