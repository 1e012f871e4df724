import { shopSettingsSchema, type ShopSettings } from '@shared/schemas/quotes'
import { request } from './http'

export const settingsApi = {
  shop: (signal?: AbortSignal) => request('GET', '/settings/shop', shopSettingsSchema, { signal }),
  saveShop: (settings: ShopSettings) => request('PUT', '/settings/shop', shopSettingsSchema, { body: settings }),
}
