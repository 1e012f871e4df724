import { defineStore } from 'pinia'
import { computed, ref } from 'vue'
import type { LoginInput, User } from '@shared/schemas/auth'
import { can, type Permission } from '@shared/permissions'
import { authApi } from '@/api/auth'
import { ApiError } from '@/api/http'

/** The signed-in user, shared by the router guard, the layout and every view. */
export const useSessionStore = defineStore('session', () => {
  const user = ref<User | null>(null)
  const checked = ref(false)
  /** Why the session could not be checked (no connection, a server fault); the sign-in page shows it. */
  const connectionError = ref<ApiError | null>(null)

  const isSignedIn = computed(() => user.value !== null)

  /**
   * Asks the server once whether a session exists (a reload keeps the user signed in).
   * Never throws: a failed check leaves the user signed out with `connectionError` set,
   * and the next call asks again.
   */
  async function restore() {
    if (checked.value) return
    try {
      user.value = await authApi.me()
      connectionError.value = null
      checked.value = true
    } catch (error) {
      user.value = null
      if (error instanceof ApiError && error.status === 401) {
        connectionError.value = null
        checked.value = true
      } else {
        connectionError.value =
          error instanceof ApiError ? error : new ApiError(0, 'client', 'Your session could not be checked. Try again.')
      }
    }
  }

  async function signIn(input: LoginInput) {
    user.value = await authApi.login(input)
    connectionError.value = null
    checked.value = true
  }

  async function signOut() {
    try {
      await authApi.logout()
    } finally {
      // A session that had already ended (401) is signed out all the same.
      user.value = null
    }
  }

  /** Forget the user locally when the server says the session ended. */
  function expire() {
    user.value = null
  }

  function allows(permission: Permission) {
    return can(user.value?.role, permission)
  }

  return { user, checked, connectionError, isSignedIn, restore, signIn, signOut, expire, allows }
})
