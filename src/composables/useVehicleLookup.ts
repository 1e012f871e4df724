import { computed, watch } from 'vue'
import { useRoute, useRouter } from 'vue-router'
import type { Vehicle, VehicleChoices, VinAnswer } from '@shared/schemas/vehicles'
import { vehiclesApi } from '@/api/vehicles'
import { queryInt, queryText } from '@/lib/route-query'
import { useRemote } from './useRemote'

/**
 * Start from the car: year, then make, then model (each choice narrows the
 * next), or a VIN. The choices live in the address, so Back steps through them.
 */
export function useVehicleLookup() {
  const route = useRoute()
  const router = useRouter()
  const choices = useRemote<VehicleChoices>()
  const vehicles = useRemote<Vehicle[]>()
  const vin = useRemote<VinAnswer>()

  const year = computed(() => queryInt(route.query.year))
  const make = computed(() => queryText(route.query.make) || undefined)
  const model = computed(() => queryText(route.query.model) || undefined)
  const vinText = computed(() => queryText(route.query.vin) || undefined)

  watch([year, make], () => choices.run((signal) => vehiclesApi.choices({ year: year.value, make: make.value }, signal)), {
    immediate: true,
  })
  watch(
    [year, make, model],
    () => {
      if (year.value && make.value && model.value)
        void vehicles.run((signal) => vehiclesApi.find({ year: year.value, make: make.value, model: model.value }, signal))
      else vehicles.reset()
    },
    { immediate: true },
  )
  watch(vinText, (value) => (value ? void vin.run((signal) => vehiclesApi.byVin(value, signal)) : vin.reset()), { immediate: true })

  /** A new year clears make and model; a new make clears the model. */
  function choose(change: { year?: number; make?: string; model?: string }) {
    const next = { year: year.value, make: make.value, model: model.value, ...change }
    if ('year' in change) Object.assign(next, { make: change.make, model: undefined })
    if ('make' in change && !('model' in change)) next.model = undefined
    void router.push({ query: { year: next.year ? String(next.year) : undefined, make: next.make, model: next.model } })
  }
  const lookUpVin = (value: string) => router.push({ query: { vin: value.trim().toUpperCase() || undefined } })

  return { year, make, model, vinText, choices, vehicles, vin, choose, lookUpVin }
}
