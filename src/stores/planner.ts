import { defineStore } from 'pinia'
import { computed, ref } from 'vue'
import { isSlotId, type SlotId } from '@shared/build-template'
import {
  faceFinishOf,
  sheetContext,
  type BuildSheet,
  type ChecklistTicks,
  type BuildSheetInput,
  type BuildSheetUpdate,
  type Evaluation,
  type FillResult,
} from '@shared/schemas/build'
import { buildsApi } from '@/api/builds'
import { useRemote } from '@/composables/useRemote'
import { buildKey, evaluateBody, filledSlotCount, type PlannerSlots, type PlannerState } from '@/lib/planner-query'

/** Where the planner last was, so coming back from another screen reopens that build. */
export type PlannerAddress = { sheetId: number | null; query: Record<string, string> }

/** The build in a saved sheet, as the planner's address holds it. */
export function sheetState(saved: BuildSheet): PlannerState {
  const slots: PlannerSlots = {}
  for (const [slot, partNumber] of Object.entries(saved.slots)) if (isSlotId(slot)) slots[slot] = partNumber
  return { slots, context: sheetContext(saved) }
}

/**
 * What the planner keeps beside the build: the saved sheet it came from, the
 * verdict of the last build checked and the last address. The build itself is
 * the address (see usePlannerBuild); every action here is given it.
 */
export const usePlannerStore = defineStore('planner', () => {
  /** The saved sheet being edited, if any. */
  const sheet = ref<BuildSheet | null>(null)
  const lastAddress = ref<PlannerAddress | null>(null)
  /** The checklist as ticked in the shop, saved with the sheet. */
  const ticks = ref<ChecklistTicks>({})
  const evaluation = useRemote<Evaluation>()
  /** The build the verdict belongs to (or is being asked for). */
  const evaluatedKey = ref<string | null>(null)

  /** Field messages from the last evaluation (unknown part, wrong kind, bad context value), by slot or field. */
  const fieldErrors = computed<Record<string, string>>(() =>
    Object.fromEntries((evaluation.error.value?.details ?? []).map((detail) => [detail.path.replace(/^slots\./, ''), detail.message])),
  )

  function openSheet(saved: BuildSheet) {
    sheet.value = saved
    ticks.value = structuredClone(saved.checklist)
  }

  function forgetSheet() {
    sheet.value = null
    ticks.value = {}
  }

  /** Start over: nothing to come back to. */
  function forget() {
    forgetSheet()
    lastAddress.value = null
  }

  function isTicked(modification: string, step: number): boolean {
    return ticks.value[modification]?.includes(step) ?? false
  }

  function setTick(modification: string, step: number, ticked: boolean) {
    const steps = (ticks.value[modification] ?? []).filter((index) => index !== step)
    if (ticked) steps.push(step)
    ticks.value = { ...ticks.value, [modification]: steps.sort((a, b) => a - b) }
  }

  /** Whether the ticks differ from the saved sheet's (or, without a sheet, whether anything is ticked). */
  const ticksChanged = computed(() => {
    const saved = sheet.value?.checklist ?? {}
    const names = new Set([...Object.keys(saved), ...Object.keys(ticks.value)])
    return [...names].some((name) => (saved[name] ?? []).join(',') !== (ticks.value[name] ?? []).join(','))
  })

  /**
   * Checks the build once. Returns the current numbers for slots typed as a mark or a
   * superseded number, for the caller to put in the address (the same build, so not checked again).
   */
  async function evaluate(state: PlannerState): Promise<Partial<Record<SlotId, string>>> {
    const key = buildKey(state)
    if (key === evaluatedKey.value) return {}
    evaluatedKey.value = key
    if (filledSlotCount(state.slots) === 0) {
      evaluation.reset()
      return {}
    }
    const result = await evaluation.run((signal) => buildsApi.evaluate(evaluateBody(state), signal))
    if (!result) {
      // A failed check may be asked again for the same build (a retry, a server back up).
      if (evaluation.error.value && evaluatedKey.value === key) evaluatedKey.value = null
      return {}
    }
    const current: Partial<Record<SlotId, string>> = {}
    for (const [slot, part] of Object.entries(result.parts)) {
      if (isSlotId(slot) && state.slots[slot] && state.slots[slot] !== part.partNumber) current[slot] = part.partNumber
    }
    return current
  }

  /** Marks a build as already checked (the same build under current part numbers). */
  function markEvaluated(state: PlannerState) {
    evaluatedKey.value = buildKey(state)
  }

  /** Asks the server to fill the empty slots (see POST /api/builds/fill); the caller puts its choices in the address. */
  function fillGaps(state: PlannerState): Promise<FillResult> {
    return buildsApi.fill(evaluateBody(state))
  }

  function sheetInput(state: PlannerState, name: string, notes = ''): BuildSheetInput {
    return { ...evaluateBody(state), name, notes, checklist: ticks.value }
  }

  /** A full update: slots and every context field (null clears what was removed). */
  function sheetUpdate(state: PlannerState): BuildSheetUpdate {
    const c = state.context
    return {
      slots: evaluateBody(state).slots,
      targetPowerKw: c.targetPowerKw ?? null,
      fuelOctane: c.fuelOctane ?? null,
      chassisModelYear: c.chassisModelYear ?? null,
      vin: c.vin ?? null,
      vehicleId: c.vehicleId ?? null,
      faceFinish: faceFinishOf(c),
      checklist: ticks.value,
    }
  }

  return {
    sheet,
    lastAddress,
    result: evaluation.data,
    isEvaluating: evaluation.isLoading,
    evaluationError: evaluation.error,
    fieldErrors,
    ticks,
    ticksChanged,
    isTicked,
    setTick,
    openSheet,
    forgetSheet,
    forget,
    evaluate,
    markEvaluated,
    fillGaps,
    sheetInput,
    sheetUpdate,
  }
})
