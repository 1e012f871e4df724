import { centsToDecimal, decimalToCents } from '@shared/money'
import {
  stockInputSchema,
  stockUpdateSchema,
  type StockCondition,
  type StockInput,
  type StockItem,
  type StockStatus,
  type StockUpdate,
} from '@shared/schemas/stock'
import { fieldMessages, issuesAsFieldErrors } from './field-errors'

/** The stock form as typed: every field text, money as a decimal. */
export type StockDraft = {
  partNumber: string
  site: string
  condition: StockCondition
  grade: '' | 'A' | 'B' | 'C'
  mileageKm: string
  donorVin: string
  donorYear: string
  location: string
  price: string
  coreCharge: string
  status: StockStatus
  damageNotes: string
  label: string
}

export type Checked<T> = { ok: true; value: T } | { ok: false; errors: Record<string, string> }

/** The server's and the schema's field names, as the form's fields are named. */
const FIELD_OF: Record<string, keyof StockDraft> = { priceCents: 'price', coreChargeCents: 'coreCharge' }
export const draftField = (path: string) => FIELD_OF[path] ?? path

export function formErrors(errors: readonly { path: string; message: string }[]): Record<string, string> {
  return fieldMessages(errors.map((error) => ({ ...error, path: draftField(error.path) })))
}

export function blankDraft(site = ''): StockDraft {
  return {
    partNumber: '',
    site,
    condition: 'new',
    grade: '',
    mileageKm: '',
    donorVin: '',
    donorYear: '',
    location: '',
    price: '',
    coreCharge: '',
    status: 'available',
    damageNotes: '',
    label: '',
  }
}

export function draftOf(item: StockItem): StockDraft {
  return {
    partNumber: item.partNumber,
    site: item.site.name,
    condition: item.condition,
    grade: item.grade ?? '',
    mileageKm: item.mileageKm === null ? '' : String(item.mileageKm),
    donorVin: item.donorVin ?? '',
    donorYear: item.donorYear === null ? '' : String(item.donorYear),
    location: item.location,
    price: centsToDecimal(item.priceCents),
    coreCharge: centsToDecimal(item.coreChargeCents),
    status: item.status,
    damageNotes: item.damageNotes,
    label: item.label ?? '',
  }
}

function money(text: string, field: 'price' | 'coreCharge', errors: Record<string, string>, blank: number | null): number | null {
  if (!text.trim() && blank !== null) return blank
  const reading = decimalToCents(text)
  if (reading.ok) return reading.cents
  errors[field] = {
    negative: 'An amount cannot be negative.',
    not_an_amount: 'Write the amount as a decimal, like 125.50.',
    too_large: 'That is more than a million.',
  }[reading.problem]
  return null
}

const wholeOrNull = (text: string) => (text.trim() ? Number(text.trim()) : null)

/** A new unit from the form, checked by the shared schema. */
export function inputOf(draft: StockDraft): Checked<StockInput> {
  const errors: Record<string, string> = {}
  const priceCents = money(draft.price, 'price', errors, null)
  const coreChargeCents = money(draft.coreCharge, 'coreCharge', errors, 0)
  const parsed = stockInputSchema.safeParse({
    partNumber: draft.partNumber,
    site: draft.site,
    condition: draft.condition,
    grade: draft.condition === 'used' && draft.grade ? draft.grade : null,
    mileageKm: wholeOrNull(draft.mileageKm),
    donorVin: draft.donorVin.trim() || null,
    donorYear: wholeOrNull(draft.donorYear),
    location: draft.location,
    priceCents: priceCents ?? 0,
    coreChargeCents: coreChargeCents ?? 0,
    status: draft.status,
    damageNotes: draft.damageNotes,
    label: draft.label.trim() || null,
  })
  if (!parsed.success) Object.assign(errors, { ...formErrors(issuesAsFieldErrors(parsed.error.issues)), ...errors })
  if (Object.keys(errors).length || !parsed.success) return { ok: false, errors }
  return { ok: true, value: parsed.data }
}

/** What the form changes on a unit: only the fields that differ, so a move sends the site and shelf alone. */
export function updateOf(draft: StockDraft, item: StockItem): Checked<StockUpdate> {
  const errors: Record<string, string> = {}
  const priceCents = money(draft.price, 'price', errors, null)
  const coreChargeCents = money(draft.coreCharge, 'coreCharge', errors, 0)
  if (Object.keys(errors).length) return { ok: false, errors }
  const grade = item.condition === 'used' && draft.grade ? draft.grade : null
  const change: Record<string, unknown> = {}
  if (draft.site !== item.site.name) change.site = draft.site
  if (draft.location.trim() !== item.location) change.location = draft.location
  if (priceCents !== item.priceCents) change.priceCents = priceCents
  if (coreChargeCents !== item.coreChargeCents) change.coreChargeCents = coreChargeCents
  if (draft.status !== item.status) change.status = draft.status
  if (draft.damageNotes.trim() !== item.damageNotes) change.damageNotes = draft.damageNotes
  if (grade !== item.grade) change.grade = grade
  const parsed = stockUpdateSchema.safeParse(change)
  if (!parsed.success) {
    const messages = formErrors(issuesAsFieldErrors(parsed.error.issues))
    return { ok: false, errors: Object.keys(change).length ? messages : { form: 'Nothing has changed yet.' } }
  }
  return { ok: true, value: parsed.data }
}
