import { onMounted, reactive, ref, shallowRef } from 'vue'
import { useRoute, useRouter } from 'vue-router'
import { newPasswordSchema } from '@shared/schemas/auth'
import type { PasswordLinkInfo } from '@shared/schemas/accounts'
import { accountsApi } from '@/api/accounts'
import { ApiError } from '@/api/http'
import { failureMessage } from './useNotify'
import { placeFieldMessages } from '@/lib/field-errors'

/** The token of a mailed link: after the #, so it never reaches a server log. */
function tokenFromHash(hash: string): string {
  return new URLSearchParams(hash.replace(/^#/, '')).get('token') ?? ''
}

/**
 * Choosing a password from an invitation or reset link: check the link first,
 * so an expired one says so before anyone types, then set the password and go
 * to sign-in with the e-mail filled in.
 */
export function useSetPassword() {
  const route = useRoute()
  const router = useRouter()
  const token = tokenFromHash(route.hash)
  const link = shallowRef<PasswordLinkInfo | null>(null)
  /** Why the link cannot be used (expired, used, cut short). */
  const linkError = ref('')
  const isChecking = ref(true)
  const draft = reactive({ password: '', repeat: '' })
  const fieldErrors = ref<Record<string, string>>({})
  const formError = ref('')
  const isSaving = ref(false)

  onMounted(async () => {
    try {
      if (!token) throw new ApiError(400, 'link_unusable', 'This link is not complete; open it again from the mail.')
      link.value = await accountsApi.linkInfo(token)
    } catch (error) {
      linkError.value = failureMessage(error)
    } finally {
      isChecking.value = false
    }
  })

  async function submit() {
    formError.value = ''
    const checked = newPasswordSchema.safeParse(draft.password)
    const errors: Record<string, string> = {}
    if (!checked.success) errors.password = checked.error.issues[0]!.message
    else if (draft.repeat !== draft.password) errors.repeat = 'The two passwords differ.'
    fieldErrors.value = errors
    if (Object.keys(errors).length > 0) return
    isSaving.value = true
    try {
      const { email } = await accountsApi.setPassword({ token, password: draft.password })
      await router.replace({ name: 'sign-in', query: { email, notice: 'password-set' } })
    } catch (error) {
      const { messages, unplaced } = placeFieldMessages(error instanceof ApiError ? error.details : [], ['password'])
      fieldErrors.value = messages
      if (error instanceof ApiError && error.code === 'link_unusable') linkError.value = error.message
      else if (unplaced || Object.keys(messages).length === 0) formError.value = failureMessage(error)
    } finally {
      isSaving.value = false
    }
  }

  return { link, linkError, isChecking, draft, fieldErrors, formError, isSaving, submit }
}
