import { ref, watch, type Ref } from 'vue'
import type { StockPhoto } from '@shared/schemas/stock'
import { stockApi } from '@/api/stock'
import { useNotify } from './useNotify'
import { useRemote } from './useRemote'

/** The photos of one unit on the shelf: listed, added a few at a time, removed. */
export function useStockPhotos(unitId: Ref<number | null>) {
  const photos = useRemote<StockPhoto[]>([])
  const busy = ref(false)
  const notify = useNotify()

  const load = () => {
    const id = unitId.value
    if (id === null) photos.reset()
    else void photos.run((signal) => stockApi.photos(id, signal))
  }
  watch(unitId, load, { immediate: true })

  async function act(work: (id: number) => Promise<StockPhoto[] | null>, failed: string) {
    const id = unitId.value
    if (id === null || busy.value) return
    busy.value = true
    try {
      const next = await work(id)
      if (next) photos.data.value = next
      else load()
    } catch (error) {
      notify.failure(failed, error)
    } finally {
      busy.value = false
    }
  }

  const add = (files: File[]) => act((id) => stockApi.addPhotos(id, files), 'Photos not added')
  const remove = (photo: StockPhoto) =>
    act(async (id) => {
      await stockApi.removePhoto(id, photo.id)
      return null
    }, 'Photo not removed')
  const url = (photo: StockPhoto, size: 'display' | 'thumb') =>
    unitId.value === null ? '' : stockApi.photoUrl(unitId.value, photo.id, size)

  return { photos, busy, add, remove, url }
}
