import { defineStore } from 'pinia'
import { computed, ref } from 'vue'
import type { LocationQuery } from 'vue-router'
import { isSlotId, type SlotId } from '@shared/build-template'
import type { BuildContext, BuildSheet, BuildSheetInput, BuildSheetUpdate, Evaluation } from '@shared/schemas/build'
import { buildsApi } from '@/api/builds'
import { useRemote } from '@/composables/useRemote'
import { createsDeadEnd, nextSlotToFill, unfilledNotes, type GapPick } from '@/lib/fill-gaps'
import { evaluateBody, filledSlotCount, plannerFromQuery, plannerToQuery, sameBuild, type PlannerSlots, type PlannerState } from '@/lib/planner-query'

/** Candidates "fill the gaps" tries for one slot before it leaves the slot empty. */
const FILL_TRIES = 5

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

  /**
   * Fills empty slots one at a time, most constrained first, with the best
   * candidate that does not leave a mating slot without any part that fits;
   * says what stayed empty and why. The live verdict then checks the whole build.
   */
  async function fillGaps(): Promise<{ filled: GapPick[]; unfilled: { slot: SlotId; note: string }[] }> {
    const complete = () => buildsApi.complete({ ...evaluateBody(state.value), limit: FILL_TRIES })
    const filled: GapPick[] = []
    const stuck = new Set<SlotId>()
    let completion = await complete()
    for (let slot = nextSlotToFill(completion); slot; slot = nextSlotToFill(completion, stuck)) {
      let accepted = false
      for (const candidate of completion.slots[slot]?.candidates ?? []) {
        setSlot(slot, candidate.part.partNumber)
        const next = await complete()
        if (!createsDeadEnd(slot, completion, next)) {
          filled.push({ slot, partNumber: candidate.part.partNumber })
          completion = next
          accepted = true
          break
        }
      }
      if (!accepted) {
        setSlot(slot, null)
        stuck.add(slot)
      }
    }
    return { filled, unfilled: unfilledNotes(completion, stuck) }
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
