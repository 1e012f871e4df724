import { computed, onMounted } from 'vue'
import type { User } from '@shared/schemas/auth'
import type { Site } from '@shared/schemas/stock'
import { stockApi } from '@/api/stock'
import { usersApi } from '@/api/users'
import { useNotify } from './useNotify'
import { useRemote } from './useRemote'

/** The users screen's home-site column: an administrator sets the site each user works at; `reload` shows what was stored. */
export function useUserHomeSites(reload: () => Promise<unknown>) {
  const notify = useNotify()
  const sites = useRemote<Site[]>()
  const options = computed(() => [
    { value: null as number | null, label: 'None' },
    ...(sites.data.value ?? []).map((site) => ({ value: site.id as number | null, label: site.name })),
  ])
  onMounted(() => sites.run((signal) => stockApi.sites(signal)))

  async function setHomeSite(user: User, homeSiteId: number | null) {
    if (homeSiteId === user.homeSiteId) return
    try {
      await usersApi.update(user.id, { homeSiteId })
      const name = options.value.find((option) => option.value === homeSiteId)?.label ?? 'None'
      notify.success(`Home site of ${user.name}: ${name}`)
    } catch (error) {
      notify.failure('Home site not changed', error)
    }
    await reload()
  }

  return { siteOptions: options, setHomeSite }
}
