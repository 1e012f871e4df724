import { reactive, ref, watch } from 'vue'
import { SHARE_DAYS, shareRequestSchema } from '@shared/schemas/shared-links'
import { ApiError } from '@/api/http'
import { sharedLinksApi, type SharedKind } from '@/api/sharedLinks'
import { fieldMessages, issuesAsFieldErrors } from '@/lib/field-errors'
import { useBusyAction } from './useBusyAction'
import { useNotify } from './useNotify'

/**
 * Sending a read-only link to a sheet or a quote: the address and how many
 * days it works, checked here with the server's own schema, then one mail queued.
 */
export function useShareByMail(kind: () => SharedKind, id: () => number | undefined) {
  const notify = useNotify()
  const isOpen = ref(false)
  const draft = reactive({ email: '', days: SHARE_DAYS.default as number })
  const fieldErrors = ref<Record<string, string>>({})

  // A message about the old value goes as soon as the field changes.
  watch(
    () => ({ ...draft }),
    (now, before) => {
      const changed = Object.keys(now).filter((key) => now[key as keyof typeof now] !== before[key as keyof typeof before])
      if (changed.length)
        fieldErrors.value = Object.fromEntries(Object.entries(fieldErrors.value).filter(([key]) => !changed.includes(key)))
    },
  )

  function open() {
    draft.email = ''
    draft.days = SHARE_DAYS.default
    fieldErrors.value = {}
    isOpen.value = true
  }

  const send = useBusyAction(async () => {
    const target = id()
    const checked = shareRequestSchema.safeParse({ ...draft })
    if (!checked.success) {
      fieldErrors.value = fieldMessages(issuesAsFieldErrors(checked.error.issues))
      return
    }
    if (target === undefined) return
    try {
      const answer = await sharedLinksApi.share(kind(), target, checked.data)
      isOpen.value = false
      notify.success('Link sent', `${answer.recipient} can read it until ${answer.expiresAt.slice(0, 10)}.`)
    } catch (error) {
      fieldErrors.value = error instanceof ApiError ? fieldMessages(error.details) : {}
      if (Object.keys(fieldErrors.value).length === 0) notify.failure('The link was not sent', error)
    }
  })

  return { isOpen, draft, fieldErrors, open, send }
}
