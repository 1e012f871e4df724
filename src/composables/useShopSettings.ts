import { computed, onMounted, ref } from 'vue'
import type { FieldError } from '@shared/schemas/errors'
import { ApiError } from '@/api/http'
import { settingsApi } from '@/api/settings'
import { placeFieldMessages } from '@/lib/field-errors'
import { SHOP_FIELDS, shopSettingsForm, shopSettingsFromForm, type ShopSettingsForm } from '@/lib/shop-settings-form'
import { useBusyAction } from './useBusyAction'
import { useNotify } from './useNotify'
import { useRemote } from './useRemote'

/** The admin's form over the shop's details; new quotes use them, quotes made earlier keep theirs. */
export function useShopSettings() {
  const notify = useNotify()
  const loaded = useRemote<ShopSettingsForm>()
  const form = ref<ShopSettingsForm | null>(null)
  const errors = ref<FieldError[]>([])
  const placed = computed(() => placeFieldMessages(errors.value, SHOP_FIELDS))

  async function load() {
    const answer = await loaded.run(async (signal) => shopSettingsForm(await settingsApi.shop(signal)))
    if (answer) form.value = { ...answer }
  }
  onMounted(load)

  const save = useBusyAction(async () => {
    if (!form.value) return
    const result = shopSettingsFromForm(form.value)
    if ('errors' in result) {
      errors.value = result.errors
      return
    }
    errors.value = []
    try {
      form.value = shopSettingsForm(await settingsApi.saveShop(result.settings))
      notify.success('Shop settings saved', 'New quotes use them; quotes made earlier keep their own.')
    } catch (error) {
      if (error instanceof ApiError && error.details.length) errors.value = error.details
      else notify.failure('Not saved', error)
    }
  })

  return { loaded, form, load, save, messages: computed(() => placed.value.messages), errors }
}
