import { shopSettingsSchema, type ShopSettings } from '../../shared/schemas/quotes'
import type { Database } from '../db/database'

const KEY = 'shop'

/** The shop's own details, as an admin keeps them: name, address, labour rate, tax, currency. */
export const DEFAULT_SHOP: ShopSettings = {
  name: 'Fitwright demo shop',
  address: '',
  labourRateCents: 8450,
  taxRateBasisPoints: 2000,
  currency: 'EUR',
  baseMinutesPerGroup: 45,
  reservationHours: 72,
}

export class ShopSettingsService {
  constructor(private readonly db: Database) {}

  async get(): Promise<ShopSettings> {
    const row = await this.db.get<{ value: string }>('SELECT "value" FROM app_setting WHERE "key" = ?', [KEY])
    if (!row) return DEFAULT_SHOP
    const parsed = shopSettingsSchema.safeParse(JSON.parse(row.value))
    return parsed.success ? parsed.data : DEFAULT_SHOP
  }

  async set(settings: ShopSettings): Promise<ShopSettings> {
    // One statement on both drivers, so two admins saving at once never leave the row missing.
    await this.db.run(
      'INSERT INTO app_setting ("key", "value") VALUES (?, ?) ON CONFLICT ("key") DO UPDATE SET "value" = excluded."value"',
      [KEY, JSON.stringify(settings)],
    )
    return settings
  }
}
