import { defineStore } from 'pinia'
import { computed, ref } from 'vue'
import type { LocationQuery } from 'vue-router'
import { isSlotId, type SlotId } from '@shared/build-template'
import type { BuildContext, BuildSheet, BuildSheetInput, BuildSheetUpdate, Evaluation, FillResult } from '@shared/schemas/build'
import { buildsApi } from '@/api/builds'
import { useRemote } from '@/composables/useRemote'
import { evaluateBody, filledSlotCount, plannerFromQuery, plannerToQuery, sameBuild, type PlannerSlots, type PlannerState } from '@/lib/planner-query'

/** The build in progress: its slots, its context, the saved sheet it came from and its live verdict. */
export const usePlannerStore = defineStore('planner', () => {
  const slots = ref<PlannerSlots>({})
  const context = ref<BuildContext>({})
  /** The saved sheet being edited, if any. */
  const sheet = ref<BuildSheet | null>(null)
  const evaluation = useRemote<Evaluation>()

  const state = computed<PlannerState>(() => ({ slots: slots.value, context: context.value }))
  const query = computed(() => plannerToQuery(state.value))
  const filledCount = computed(() => filledSlotCount(slots.value))

  /** Field messages from the last evaluation (unknown part, wrong kind, bad context value), by slot or field. */
  const fieldErrors = computed<Record<string, string>>(() =>
    Object.fromEntries((evaluation.error.value?.details ?? []).map((detail) => [detail.path.replace(/^slots\./, ''), detail.message])),
  )

  const isDirty = computed(() => (sheet.value ? !sameBuild(plannerToQuery(fromSheet(sheet.value)), query.value) : filledCount.value > 0))

  function fromSheet(saved: BuildSheet): PlannerState {
    const sheetSlots: PlannerSlots = {}
    for (const [slot, partNumber] of Object.entries(saved.slots)) if (isSlotId(slot)) sheetSlots[slot] = partNumber
    const sheetContext: BuildContext = {}
    if (saved.targetPowerKw !== null) sheetContext.targetPowerKw = saved.targetPowerKw
    if (saved.fuelOctane !== null) sheetContext.fuelOctane = saved.fuelOctane
    if (saved.chassisModelYear !== null) sheetContext.chassisModelYear = saved.chassisModelYear
    if (saved.vin) sheetContext.vin = saved.vin
    return { slots: sheetSlots, context: sheetContext }
  }

  function apply(next: PlannerState) {
    slots.value = { ...next.slots }
    context.value = { ...next.context }
  }

  function applyQuery(routeQuery: LocationQuery) {
    apply(plannerFromQuery(routeQuery))
  }

  /** Opens a saved sheet; with `keepEdits` the slots in the address stay (a shared link to an edited sheet). */
  function openSheet(saved: BuildSheet, keepEdits = false) {
    sheet.value = saved
    if (!keepEdits) apply(fromSheet(saved))
  }

  function forgetSheet() {
    sheet.value = null
  }

  function setSlot(slot: SlotId, partNumber: string | null) {
    const next = { ...slots.value }
    if (partNumber?.trim()) next[slot] = partNumber.trim()
    else delete next[slot]
    slots.value = next
  }

  function setContext(change: Partial<BuildContext>) {
    const next: BuildContext = { ...context.value, ...change }
    for (const key of Object.keys(next) as (keyof BuildContext)[]) if (next[key] === undefined || next[key] === '') delete next[key]
    context.value = next
  }

  function clear() {
    apply({ slots: {}, context: {} })
  }

  async function evaluate() {
    if (filledCount.value === 0) {
      evaluation.data.value = null
      evaluation.error.value = null
      return
    }
    const result = await evaluation.run((signal) => buildsApi.evaluate(evaluateBody(state.value), signal))
    if (!result) return
    // A mark or superseded number typed into a slot becomes the part's current number.
    for (const [slot, part] of Object.entries(result.parts)) {
      if (isSlotId(slot) && slots.value[slot] && slots.value[slot] !== part.partNumber) setSlot(slot, part.partNumber)
    }
  }

  /** Asks the server to fill the empty slots (see POST /api/builds/fill) and takes its choices. */
  async function fillGaps(): Promise<Pick<FillResult, 'filled' | 'unfilled'>> {
    const result = await buildsApi.fill(evaluateBody(state.value))
    for (const { slot, partNumber } of result.filled) if (isSlotId(slot)) setSlot(slot, partNumber)
    return result
  }

  function sheetInput(name: string, notes = ''): BuildSheetInput {
    const body = evaluateBody(state.value)
    return { ...body, name, notes }
  }

  /** A full update: slots and every context field (null clears what was removed). */
  function sheetUpdate(): BuildSheetUpdate {
    const c = context.value
    return {
      slots: evaluateBody(state.value).slots,
      targetPowerKw: c.targetPowerKw ?? null,
      fuelOctane: c.fuelOctane ?? null,
      chassisModelYear: c.chassisModelYear ?? null,
      vin: c.vin ?? null,
    }
  }

  return {
    slots,
    context,
    sheet,
    result: evaluation.data,
    isEvaluating: evaluation.isLoading,
    evaluationError: evaluation.error,
    state,
    query,
    filledCount,
    fieldErrors,
    isDirty,
    applyQuery,
    openSheet,
    forgetSheet,
    setSlot,
    setContext,
    clear,
    evaluate,
    fillGaps,
    sheetInput,
    sheetUpdate,
  }
})
