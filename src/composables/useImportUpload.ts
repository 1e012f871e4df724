import { computed, ref, shallowRef, watch } from 'vue'
import type { ImportMode, ImportResult, ImportType } from '@shared/schemas/imports'
import { ApiError } from '@/api/http'
import { importsApi, type UploadProgress } from '@/api/imports'
import { fileKindHint, headerCells } from '@/lib/import-file-kind'

/**
 * One import from file choice to commit: preview first, then commit the same
 * file. A new file or type drops the preview, so a commit never goes out
 * against a preview of something else.
 */
export function useImportUpload(allowed: readonly ImportType[] = ['parts']) {
  const file = shallowRef<File | null>(null)
  const type = ref<ImportType>(allowed[0] ?? 'parts')
  const result = shallowRef<ImportResult | null>(null)
  const error = ref<ApiError | null>(null)
  const progress = ref<UploadProgress | null>(null)
  const isBusy = ref(false)

  const header = shallowRef<string[]>([])

  watch([file, type], () => {
    result.value = null
    error.value = null
  })
  // The header is read here so a file of the wrong kind is named before it is sent.
  watch(file, async (chosen) => {
    header.value = []
    const text = chosen ? await chosen.slice(0, 64 * 1024).text() : ''
    if (file.value === chosen) header.value = headerCells(text)
  })
  const kindHint = computed(() => fileKindHint(header.value, type.value))

  const isCommitted = computed(() => result.value?.batchId !== undefined)
  const rejectedRows = computed(() => result.value?.counts.rejected ?? 0)
  const canCommit = computed(() => !!file.value && !!result.value && !isCommitted.value && !isBusy.value)

  async function send(mode: ImportMode, validRowsOnly = false): Promise<ImportResult | null> {
    if (!file.value) return null
    isBusy.value = true
    error.value = null
    progress.value = null
    try {
      const answer = await importsApi.upload({
        file: file.value,
        type: type.value,
        mode,
        validRowsOnly,
        onProgress: (next) => (progress.value = next),
      })
      result.value = answer
      return answer
    } catch (cause) {
      error.value = cause instanceof ApiError ? cause : new ApiError(0, 'client', 'Something went wrong while importing. Try again.')
      return null
    } finally {
      isBusy.value = false
      progress.value = null
    }
  }

  return {
    file,
    type,
    result,
    error,
    progress,
    isBusy,
    isCommitted,
    rejectedRows,
    canCommit,
    kindHint,
    preview: () => send('preview'),
    commit: (validRowsOnly: boolean) => send('commit', validRowsOnly),
  }
}
