import { onMounted, reactive, ref } from 'vue'
import { useConfirm } from 'primevue/useconfirm'
import { ROLE_LABELS, ROLES, type Role, type User } from '@shared/schemas/auth'
import { userInviteSchema } from '@shared/schemas/accounts'
import { accountsApi } from '@/api/accounts'
import { ApiError } from '@/api/http'
import { usersApi } from '@/api/users'
import { fieldMessages, issuesAsFieldErrors, placeFieldMessages } from '@/lib/field-errors'
import { useNotify } from './useNotify'
import { useRemote } from './useRemote'

export type UserDraft = { email: string; name: string; role: Role }

/** The fields the "invite a user" form shows; a message for any other goes to the toast. */
const DRAFT_FIELDS = ['email', 'name', 'role'] as const

const ROLE_OPTIONS = ROLES.map((role) => ({ value: role, label: ROLE_LABELS[role] }))

/**
 * The users screen: the list, inviting a user (again), changing a role, disabling and enabling. Every failure
 * is said: a field's message beside the field, anything else in the toast.
 */
export function useUsers() {
  const notify = useNotify()
  const confirm = useConfirm()
  /** Roles chosen in a select but not stored yet (asking, saving); anything else shows what the server holds. */
  const pendingRoles = ref<Partial<Record<number, Role>>>({})
  const list = useRemote<User[]>()
  const draft = reactive<UserDraft>({ email: '', name: '', role: 'counter' })
  const fieldErrors = ref<Record<string, string>>({})
  const isSaving = ref(false)

  const load = () => list.run((signal) => usersApi.list(signal))
  onMounted(load)

  /** Invites the user in the draft; on success the draft is cleared (the role stays for the next one). */
  async function invite(): Promise<User | null> {
    const parsed = userInviteSchema.safeParse(draft)
    if (!parsed.success) {
      fieldErrors.value = fieldMessages(issuesAsFieldErrors(parsed.error.issues))
      return null
    }
    fieldErrors.value = {}
    isSaving.value = true
    try {
      const user = await accountsApi.invite(parsed.data)
      Object.assign(draft, { email: '', name: '' })
      notify.success(`Invitation sent to ${user.name}`, user.email)
      void load()
      return user
    } catch (error) {
      const { messages, unplaced } = placeFieldMessages(error instanceof ApiError ? error.details : [], DRAFT_FIELDS)
      fieldErrors.value = messages
      if (unplaced || Object.keys(messages).length === 0) notify.failure('User not invited', error)
      return null
    } finally {
      isSaving.value = false
    }
  }

  /** A new link for someone whose invitation ran out or went astray; the earlier one stops working. */
  async function inviteAgain(user: User) {
    try {
      await accountsApi.inviteAgain(user.id)
      notify.success(`New invitation sent to ${user.name}`, user.email)
    } catch (error) {
      notify.failure('Invitation not sent', error)
    }
  }

  const roleShown = (user: User): Role => pendingRoles.value[user.id] ?? user.role

  function settle(user: User) {
    const { [user.id]: _settled, ...rest } = pendingRoles.value
    pendingRoles.value = rest
  }

  async function changeRole(user: User, role: Role) {
    try {
      await usersApi.update(user.id, { role })
      notify.success(`${user.name} is now ${ROLE_LABELS[role]}`)
    } catch (error) {
      notify.failure('Role not changed', error)
    }
    // Either way the list shows what the server holds now, and the select with it.
    await load()
    settle(user)
  }

  /** A role decides what someone may see and change, so a change is confirmed first. */
  function askRoleChange(user: User, role: Role) {
    if (role === user.role) return settle(user)
    pendingRoles.value = { ...pendingRoles.value, [user.id]: role }
    confirm.require({
      header: `Make ${user.name} ${ROLE_LABELS[role]}?`,
      message: `${user.name} is ${ROLE_LABELS[user.role]} now. The new role applies from their next request.`,
      acceptProps: { label: `Make ${ROLE_LABELS[role]}` },
      rejectProps: { label: `Keep ${ROLE_LABELS[user.role]}`, severity: 'secondary', outlined: true },
      accept: () => void changeRole(user, role),
      reject: () => settle(user),
      onHide: () => settle(user),
    })
  }

  async function setDisabled(user: User, disabled: boolean) {
    try {
      await usersApi.update(user.id, { disabled })
      notify.success(disabled ? `${user.name} is disabled` : `${user.name} can sign in again`)
    } catch (error) {
      notify.failure(disabled ? 'User not disabled' : 'User not enabled', error)
    }
    await load()
  }

  /** Disabling signs the user out everywhere at once, so it is confirmed first. */
  function askDisabledChange(user: User) {
    const disabling = !user.disabled
    confirm.require({
      header: disabling ? `Disable ${user.name}?` : `Enable ${user.name}?`,
      message: disabling
        ? `${user.name} is signed out everywhere now and cannot sign in until an administrator enables the account again.`
        : `${user.name} can sign in again with their current password.`,
      acceptProps: { label: disabling ? 'Disable' : 'Enable', severity: disabling ? 'danger' : undefined },
      rejectProps: { label: 'Cancel', severity: 'secondary', outlined: true },
      accept: () => void setDisabled(user, disabling),
    })
  }

  return {
    users: list.data,
    isLoading: list.isLoading,
    error: list.error,
    load,
    roleOptions: ROLE_OPTIONS,
    draft,
    fieldErrors,
    isSaving,
    invite,
    inviteAgain,
    roleShown,
    askRoleChange,
    askDisabledChange,
  }
}
