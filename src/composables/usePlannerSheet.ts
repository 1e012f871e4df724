import { computed, ref } from 'vue'
import { useRouter } from 'vue-router'
import { useToast } from 'primevue/usetoast'
import { ApiError } from '@/api/http'
import { useBuildSheetsStore } from '@/stores/buildSheets'
import { usePlannerStore } from '@/stores/planner'

export type SheetDialog = 'new' | 'rename' | null

/** Saving, saving as, renaming and starting over: the planner's build-sheet actions and their dialog. */
export function usePlannerSheet() {
  const planner = usePlannerStore()
  const sheets = useBuildSheetsStore()
  const router = useRouter()
  const toast = useToast()
  const dialog = ref<SheetDialog>(null)
  const saving = ref(false)
  const fieldError = ref('')

  const dialogTitle = computed(() => (dialog.value === 'rename' ? 'Name and notes of the build sheet' : 'Save as a new build sheet'))

  function fail(summary: string, error: unknown) {
    if (error instanceof ApiError && error.fieldMessage('name')) {
      fieldError.value = error.fieldMessage('name')!
      return
    }
    toast.add({ severity: 'error', summary, detail: error instanceof Error ? error.message : String(error), life: 8000 })
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
      toast.add({ severity: 'success', summary: `Saved “${sheet.name}”`, life: 3000 })
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
        toast.add({ severity: 'success', summary: `Renamed to “${value.name}”`, life: 3000 })
      } else {
        const saved = await sheets.create(planner.sheetInput(value.name, value.notes))
        planner.openSheet(saved, true)
        await router.replace({ name: 'planner-sheet', params: { id: saved.id }, query: planner.query })
        toast.add({ severity: 'success', summary: `Saved “${saved.name}”`, detail: 'Find it again under Build sheets.', life: 4000 })
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
