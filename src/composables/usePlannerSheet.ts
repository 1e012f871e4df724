import { computed, ref } from 'vue'
import { useRouter } from 'vue-router'
import { ApiError } from '@/api/http'
import { useBuildSheetsStore } from '@/stores/buildSheets'
import { usePlannerStore } from '@/stores/planner'
import { useBusyAction } from './useBusyAction'
import { useNotify } from './useNotify'
import type { usePlannerBuild } from './usePlannerBuild'

export type SheetDialog = 'new' | 'rename' | null

/** Saving, saving as, renaming and starting over: the planner's build-sheet actions and their dialog. */
export function usePlannerSheet(build: ReturnType<typeof usePlannerBuild>) {
  const planner = usePlannerStore()
  const sheets = useBuildSheetsStore()
  const router = useRouter()
  const notify = useNotify()
  const dialog = ref<SheetDialog>(null)
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
  async function saveInPlace() {
    const sheet = planner.sheet
    if (!sheet) return openDialog('new')
    try {
      planner.openSheet(await sheets.update(sheet.id, planner.sheetUpdate(build.state.value)))
      notify.success(`Saved “${sheet.name}”`)
    } catch (error) {
      fail('The build sheet was not saved', error)
    }
  }

  async function saveFromDialog(value: { name: string; notes: string }) {
    fieldError.value = ''
    try {
      if (dialog.value === 'rename' && planner.sheet) {
        planner.openSheet(await sheets.update(planner.sheet.id, { name: value.name, notes: value.notes }))
        notify.success(`Renamed to “${value.name}”`)
      } else {
        const saved = await sheets.create(planner.sheetInput(build.state.value, value.name, value.notes))
        planner.openSheet(saved)
        // The same build under the sheet's address: no new history entry for it.
        await router.replace({ name: 'planner-sheet', params: { id: saved.id }, query: build.query.value })
        notify.success(`Saved “${saved.name}”`, 'Find it again under Build sheets.')
      }
      dialog.value = null
    } catch (error) {
      fail('The build sheet was not saved', error)
    }
  }

  // One save at a time, whichever button or dialog asked for it.
  const saveAction = useBusyAction(async (run: () => Promise<void>) => run())
  const save = () => saveAction.run(saveInPlace)
  const submit = (value: { name: string; notes: string }) => saveAction.run(() => saveFromDialog(value))

  function startOver() {
    planner.forget()
    void router.push({ name: 'planner' })
  }

  return { dialog, dialogTitle, saving: saveAction.isRunning, fieldError, openDialog, save, submit, startOver }
}
