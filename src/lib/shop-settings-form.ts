import type { FieldError } from '@shared/schemas/errors'
import { shopSettingsSchema, type ShopSettings } from '@shared/schemas/quotes'
import { centsToDecimal, decimalToCents } from '@shared/money'
import { issuesAsFieldErrors } from './field-errors'

/** The shop settings as the form holds them: money and the tax rate as the decimals a person types. */
export type ShopSettingsForm = {
  name: string
  address: string
  labourRate: string
  taxRate: string
  currency: string
  /** Null while the number field is empty. */
  baseMinutesPerGroup: number | null
  reservationHours: number | null
}

/** Field errors use the settings' own keys, so the server's messages land beside the same fields. */
export const SHOP_FIELDS = [
  'name',
  'address',
  'labourRateCents',
  'taxRateBasisPoints',
  'currency',
  'baseMinutesPerGroup',
  'reservationHours',
] as const

export function shopSettingsForm(settings: ShopSettings): ShopSettingsForm {
  return {
    name: settings.name,
    address: settings.address,
    labourRate: centsToDecimal(settings.labourRateCents),
    // Basis points are hundredths of a percent, written the way cents are.
    taxRate: centsToDecimal(settings.taxRateBasisPoints),
    currency: settings.currency,
    baseMinutesPerGroup: settings.baseMinutesPerGroup,
    reservationHours: settings.reservationHours,
  }
}

/** The settings to save, or the message for each field that cannot be saved as typed. */
export function shopSettingsFromForm(form: ShopSettingsForm): { settings: ShopSettings } | { errors: FieldError[] } {
  const errors: FieldError[] = []
  const labourRate = decimalToCents(form.labourRate)
  const labourRateCents = labourRate.ok ? labourRate.cents : null
  if (labourRateCents === null) errors.push({ path: 'labourRateCents', message: 'Give the rate per hour as an amount, like 84.50.' })
  const taxRate = decimalToCents(form.taxRate)
  const taxRateBasisPoints = taxRate.ok ? taxRate.cents : null
  if (taxRateBasisPoints === null) errors.push({ path: 'taxRateBasisPoints', message: 'Give the tax as a percentage, like 20 or 8.25.' })
  if (form.baseMinutesPerGroup === null) errors.push({ path: 'baseMinutesPerGroup', message: 'Give the minutes per group (0 for none).' })
  if (form.reservationHours === null) errors.push({ path: 'reservationHours', message: 'Give how many hours a unit stays held.' })
  const parsed = shopSettingsSchema.safeParse({
    name: form.name,
    address: form.address,
    labourRateCents: labourRateCents ?? 0,
    taxRateBasisPoints: taxRateBasisPoints ?? 0,
    currency: form.currency.trim().toUpperCase(),
    baseMinutesPerGroup: form.baseMinutesPerGroup ?? 0,
    reservationHours: form.reservationHours ?? 1,
  })
  if (!parsed.success) errors.push(...issuesAsFieldErrors(parsed.error.issues))
  return errors.length || !parsed.success ? { errors } : { settings: parsed.data }
}
