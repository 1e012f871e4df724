import { reactive, ref } from 'vue'
import { changePasswordSchema } from '@shared/schemas/accounts'
import { accountsApi } from '@/api/accounts'
import { ApiError } from '@/api/http'
import { fieldMessages, issuesAsFieldErrors, placeFieldMessages } from '@/lib/field-errors'
import { useNotify } from './useNotify'

const FIELDS = ['currentPassword', 'password', 'repeat'] as const

/** Changing one's own password: the current one proves it is you; your other sessions end. */
export function useChangePassword() {
  const notify = useNotify()
  const draft = reactive({ currentPassword: '', password: '', repeat: '' })
  const fieldErrors = ref<Record<string, string>>({})
  const isSaving = ref(false)

  async function submit() {
    const parsed = changePasswordSchema.safeParse(draft)
    const errors = parsed.success ? {} : fieldMessages(issuesAsFieldErrors(parsed.error.issues))
    if (parsed.success && draft.repeat !== draft.password) errors.repeat = 'The two passwords differ.'
    fieldErrors.value = errors
    if (!parsed.success || Object.keys(errors).length > 0) return
    isSaving.value = true
    try {
      await accountsApi.changePassword(parsed.data)
      Object.assign(draft, { currentPassword: '', password: '', repeat: '' })
      notify.success('Password changed', 'You stay signed in here; your other sessions are signed out.')
    } catch (error) {
      const { messages, unplaced } = placeFieldMessages(error instanceof ApiError ? error.details : [], FIELDS)
      fieldErrors.value = messages
      if (unplaced || Object.keys(messages).length === 0) notify.failure('Password not changed', error)
    } finally {
      isSaving.value = false
    }
  }

  return { draft, fieldErrors, isSaving, submit }
}
