import { computed, reactive, ref } from 'vue'
import { FIELD_REPORT_MAX_PHOTOS, fieldReportInputSchema, type FieldReport } from '@shared/schemas/field-reports'
import type { Relation } from '@shared/schemas/fitment'
import { ApiError } from '@/api/http'
import { fieldReportsApi } from '@/api/fieldReports'
import { fieldMessages, issuesAsFieldErrors } from '@/lib/field-errors'
import type { StartingReport } from '@/lib/field-report-query'

export type PairDraft = { from: string; to: string; relation: Relation; modifications: string; note: string }
export type MeasurementDraft = { name: string; value: string; unit: string }

const blankPair = (from = '', to = '', relation: Relation = 'fits'): PairDraft => ({ from, to, relation, modifications: '', note: '' })
const optionalNumber = (text: string) => (text.trim() === '' ? undefined : Number(text))

/**
 * The report form's draft, its checks (the shared schema's own messages, by
 * field path) and sending it with the photos. Starts from the pairs the page
 * it was opened from knows (a what-fits line, a build sheet).
 */
export function useFieldReportForm(start: StartingReport) {
  const pairs = ref<PairDraft[]>(start.pairs.length ? start.pairs.map((p) => blankPair(p.from, p.to, p.relation)) : [blankPair()])
  const vehicle = reactive({ modelYear: start.modelYear ?? '', vin: start.vin ?? '', mileageKm: '' })
  const measurements = ref<MeasurementDraft[]>([])
  const notes = ref('')
  const photos = ref<File[]>([])
  const errors = ref<Record<string, string>>({})
  const saving = ref(false)
  const failure = ref<ApiError | null>(null)

  const canAddPhoto = computed(() => photos.value.length < FIELD_REPORT_MAX_PHOTOS)

  function draft() {
    const hasVehicle = vehicle.modelYear || vehicle.vin || vehicle.mileageKm
    return {
      pairs: pairs.value.map((pair) => ({
        from: pair.from,
        to: pair.to,
        relation: pair.relation,
        modifications: pair.modifications
          .split(/[,;\s]+/)
          .map((name) => name.trim())
          .filter(Boolean),
        note: pair.note,
      })),
      vehicle: hasVehicle
        ? {
            modelYear: optionalNumber(vehicle.modelYear),
            vin: vehicle.vin.trim() || undefined,
            mileageKm: optionalNumber(vehicle.mileageKm),
          }
        : undefined,
      measurements: measurements.value.map((m) => ({ name: m.name, value: Number(m.value), unit: m.unit })),
      notes: notes.value,
    }
  }

  /** Sends the report; answers it, or null with the field errors (or the failure) set. */
  async function submit(): Promise<FieldReport | null> {
    errors.value = {}
    failure.value = null
    const parsed = fieldReportInputSchema.safeParse(draft())
    if (!parsed.success) {
      errors.value = fieldMessages(issuesAsFieldErrors(parsed.error.issues))
      return null
    }
    saving.value = true
    try {
      return await fieldReportsApi.file(parsed.data, photos.value)
    } catch (error) {
      if (error instanceof ApiError) errors.value = fieldMessages(error.details)
      failure.value = error instanceof ApiError ? error : new ApiError(0, 'client', String(error))
      return null
    } finally {
      saving.value = false
    }
  }

  return {
    pairs,
    vehicle,
    measurements,
    notes,
    photos,
    errors,
    saving,
    failure,
    canAddPhoto,
    addPair: () => pairs.value.push(blankPair()),
    removePair: (index: number) => pairs.value.splice(index, 1),
    addMeasurement: () => measurements.value.push({ name: '', value: '', unit: 'mm' }),
    removeMeasurement: (index: number) => measurements.value.splice(index, 1),
    submit,
  }
}
