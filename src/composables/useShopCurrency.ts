import { computed, onMounted } from 'vue'
import type { ShopSettings } from '@shared/schemas/quotes'
import { settingsApi } from '@/api/settings'
import { useRemote } from './useRemote'

/** The shop's currency, for money shown outside a quote (a quote carries its own). Null until known. */
export function useShopCurrency() {
  const shop = useRemote<ShopSettings>()
  onMounted(() => shop.run((signal) => settingsApi.shop(signal)))
  return computed(() => shop.data.value?.currency ?? null)
}
