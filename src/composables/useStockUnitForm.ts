import { reactive, ref, shallowRef, watch, type Ref } from 'vue'
import type { Site, StockItem } from '@shared/schemas/stock'
import { ApiError } from '@/api/http'
import { stockApi } from '@/api/stock'
import { blankDraft, draftOf, formErrors, inputOf, updateOf, type Checked, type StockDraft } from '@/lib/stock-draft'

type Sender = { ok: true; run: () => Promise<StockItem> } | { ok: false; errors: Record<string, string> }

function sender<T>(checked: Checked<T>, call: (value: T) => Promise<StockItem>): Sender {
  return checked.ok ? { ok: true, run: () => call(checked.value) } : checked
}

const failureOf = (cause: unknown) => (cause instanceof ApiError ? cause : new ApiError(0, 'client', 'Something went wrong. Try again.'))

/**
 * One stock unit's form: a new unit (no id) or an existing one to edit or move.
 * Keeps the draft, the sites to choose from, field errors beside their fields
 * and any other failure for the page to show.
 */
export function useStockUnitForm(id: Ref<number | null>) {
  const sites = shallowRef<Site[]>([])
  const item = shallowRef<StockItem | null>(null)
  const draft = reactive<StockDraft>(blankDraft())
  const errors = ref<Record<string, string>>({})
  const failure = ref<ApiError | null>(null)
  const isLoading = ref(false)
  const saving = ref(false)

  async function load(unitId: number | null) {
    isLoading.value = true
    failure.value = null
    errors.value = {}
    try {
      const [siteList, unit] = await Promise.all([stockApi.sites(), unitId === null ? Promise.resolve(null) : stockApi.get(unitId)])
      sites.value = siteList
      item.value = unit
      Object.assign(draft, unit ? draftOf(unit) : blankDraft(siteList[0]?.name ?? ''))
    } catch (cause) {
      failure.value = failureOf(cause)
    } finally {
      isLoading.value = false
    }
  }
  watch(id, (unitId) => void load(unitId), { immediate: true })

  /** Adds or updates the unit; answers it, or null with the errors set. */
  async function save(): Promise<StockItem | null> {
    errors.value = {}
    failure.value = null
    const current = item.value
    const send = current
      ? sender(updateOf(draft, current), (change) => stockApi.update(current.id, change))
      : sender(inputOf(draft), stockApi.create)
    if (!send.ok) {
      errors.value = send.errors
      return null
    }
    saving.value = true
    try {
      const saved = await send.run()
      item.value = saved
      Object.assign(draft, draftOf(saved))
      return saved
    } catch (cause) {
      if (cause instanceof ApiError) errors.value = formErrors(cause.details)
      failure.value = failureOf(cause)
      return null
    } finally {
      saving.value = false
    }
  }

  return { sites, item, draft, errors, failure, isLoading, saving, save }
}
