import { ref } from 'vue'
import { useRouter } from 'vue-router'
import { ApiError } from '@/api/http'
import { stockApi } from '@/api/stock'

/**
 * "Scan or type a label": a scanner types the code and presses Enter, so one
 * submit finds the unit and opens it; a code no unit carries is said beside the box.
 */
export function useStockLabel() {
  const router = useRouter()
  const label = ref('')
  const error = ref<string | null>(null)
  const isLooking = ref(false)

  async function open() {
    const code = label.value.trim()
    error.value = null
    if (!code) {
      error.value = 'Scan or type the code on the label.'
      return
    }
    isLooking.value = true
    try {
      const unit = await stockApi.byLabel(code)
      label.value = ''
      await router.push({ name: 'stock-unit', params: { id: unit.id } })
    } catch (cause) {
      error.value = cause instanceof ApiError ? cause.message : 'Something went wrong. Try again.'
    } finally {
      isLooking.value = false
    }
  }

  return { label, error, isLooking, open }
}
