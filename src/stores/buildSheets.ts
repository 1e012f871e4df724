import { defineStore } from 'pinia'
import { computed } from 'vue'
import type { BuildSheet, BuildSheetInput, BuildSheetUpdate } from '@shared/schemas/build'
import { buildsApi } from '@/api/builds'
import { useRemote } from '@/composables/useRemote'

/** The signed-in user's saved build sheets (all of them for editors and administrators). */
export const useBuildSheetsStore = defineStore('buildSheets', () => {
  /** Null until the list has come once: a saved sheet must not stand in for it as a list of one. */
  const list = useRemote<BuildSheet[]>()
  const loaded = computed(() => list.data.value !== null)

  async function load() {
    await list.run((signal) => buildsApi.list(signal))
  }

  function replace(saved: BuildSheet) {
    const current = list.data.value
    if (current === null) return
    list.data.value = [saved, ...current.filter((sheet) => sheet.id !== saved.id)]
  }

  /** Saves a new sheet and puts it at the top of the list. */
  async function create(input: BuildSheetInput) {
    const saved = await buildsApi.create(input)
    replace(saved)
    return saved
  }

  /** Renames or re-slots a sheet; only the fields given change. */
  async function update(id: number, change: BuildSheetUpdate) {
    const saved = await buildsApi.update(id, change)
    replace(saved)
    return saved
  }

  async function remove(id: number) {
    await buildsApi.remove(id)
    const current = list.data.value
    if (current !== null) list.data.value = current.filter((sheet) => sheet.id !== id)
  }

  const get = (id: number) => buildsApi.get(id)

  return { sheets: list.data, loaded, isLoading: list.isLoading, error: list.error, load, create, update, remove, get }
})
