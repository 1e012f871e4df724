import { onMounted, ref } from 'vue'
import type { ImportBatch } from '@shared/schemas/imports'
import { importsApi } from '@/api/imports'
import { useRemote } from './useRemote'

/** The batch list of the imports view, and reverting a batch from it. */
export function useImportBatches() {
  const remote = useRemote<ImportBatch[]>([])
  const revertingId = ref<number | null>(null)

  const load = () => remote.run((signal) => importsApi.list(signal))
  onMounted(load)

  /** Throws the server's reason when the revert is refused; the list is reloaded either way. */
  async function revert(batch: ImportBatch): Promise<ImportBatch> {
    revertingId.value = batch.id
    try {
      return await importsApi.revert(batch.id)
    } finally {
      revertingId.value = null
      void load()
    }
  }

  return { ...remote, load, revert, revertingId }
}
