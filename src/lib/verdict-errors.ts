import { isSlotId } from '@shared/build-template'
import { slotLabel } from './slot-status'

export type BannerError = { field: string; label: string; message: string; inputId: string }

/** Context fields: their words on screen and the input that holds them. */
const CONTEXT_FIELDS: Record<string, { label: string; inputId: string }> = {
  targetPowerKw: { label: 'Target power', inputId: 'ctx-power' },
  fuelOctane: { label: 'Fuel octane', inputId: 'ctx-octane' },
  chassisModelYear: { label: 'Car model year', inputId: 'ctx-year' },
  vin: { label: 'VIN', inputId: 'ctx-vin' },
  deckRaUm: { label: 'Deck finish', inputId: 'ctx-deck-ra' },
  deckFlatnessMm: { label: 'Deck out-of-flat', inputId: 'ctx-deck-flat' },
  headRaUm: { label: 'Head face finish', inputId: 'ctx-head-ra' },
  headFlatnessMm: { label: 'Head face out-of-flat', inputId: 'ctx-head-flat' },
}

/**
 * The values the server could not judge, by field, with the input to jump to:
 * the banner names them, since the field itself may be off screen on a tablet.
 */
export function bannerErrors(fieldErrors: Record<string, string>): BannerError[] {
  return Object.entries(fieldErrors).map(([field, message]) => {
    if (isSlotId(field)) return { field, label: slotLabel(field), message, inputId: `slot-${field}` }
    const context = CONTEXT_FIELDS[field]
    return { field, label: context?.label ?? field, message, inputId: context?.inputId ?? '' }
  })
}
