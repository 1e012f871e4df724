import { computed, ref } from 'vue'
import { useRouter } from 'vue-router'
import { ApiError } from '@/api/http'
import { useBuildSheetsStore } from '@/stores/buildSheets'
import { usePlannerStore } from '@/stores/planner'
import { useNotify } from './useNotify'

export type SheetDialog = 'new' | 'rename' | null

/** Saving, saving as, renaming and starting over: the planner's build-sheet actions and their dialog. */
export function usePlannerSheet() {
  const planner = usePlannerStore()
  const sheets = useBuildSheetsStore()
  const router = useRouter()
  const notify = useNotify()
  const dialog = ref<SheetDialog>(null)
  const saving = ref(false)
  const fieldError = ref('')

  const dialogTitle = computed(() => (dialog.value === 'rename' ? 'Name and notes of the build sheet' : 'Save as a new build sheet'))

  function fail(summary: string, error: unknown) {
    if (error instanceof ApiError && error.fieldMessage('name')) {
      fieldError.value = error.fieldMessage('name')!
      return
    }
    notify.failure(summary, error)
  }

  function openDialog(kind: Exclude<SheetDialog, null>) {
    fieldError.value = ''
    dialog.value = kind
  }

  /** Saves the open sheet in place; a build without a sheet asks for a name first. */
  async function save() {
    const sheet = planner.sheet
    if (!sheet) return openDialog('new')
    saving.value = true
    try {
      planner.openSheet(await sheets.update(sheet.id, planner.sheetUpdate()), true)
      notify.success(`Saved “${sheet.name}”`)
    } catch (error) {
      fail('The build sheet was not saved', error)
    } finally {
      saving.value = false
    }
  }

  async function submit(value: { name: string; notes: string }) {
    saving.value = true
    fieldError.value = ''
    try {
      if (dialog.value === 'rename' && planner.sheet) {
        planner.openSheet(await sheets.update(planner.sheet.id, { name: value.name, notes: value.notes }), true)
        notify.success(`Renamed to “${value.name}”`)
      } else {
        const saved = await sheets.create(planner.sheetInput(value.name, value.notes))
        planner.openSheet(saved, true)
        await router.replace({ name: 'planner-sheet', params: { id: saved.id }, query: planner.query })
        notify.success(`Saved “${saved.name}”`, 'Find it again under Build sheets.')
      }
      dialog.value = null
    } catch (error) {
      fail('The build sheet was not saved', error)
    } finally {
      saving.value = false
    }
  }

  function startOver() {
    planner.clear()
    planner.forgetSheet()
    void router.push({ name: 'planner' })
  }

  return { dialog, dialogTitle, saving, fieldError, openDialog, save, submit, startOver }
}
