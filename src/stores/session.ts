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

  const isSignedIn = computed(() => user.value !== null)

  /** Asks the server once whether a session exists (a reload keeps the user signed in). */
  async function restore() {
    if (checked.value) return
    try {
      user.value = await authApi.me()
    } catch (error) {
      if (!(error instanceof ApiError && error.status === 401)) throw error
      user.value = null
    } finally {
      checked.value = true
    }
  }

  async function signIn(input: LoginInput) {
    user.value = await authApi.login(input)
    checked.value = true
  }

  async function signOut() {
    await authApi.logout()
    user.value = null
  }

  /** Forget the user locally when the server says the session ended. */
  function expire() {
    user.value = null
  }

  function allows(permission: Permission) {
    return can(user.value?.role, permission)
  }

  return { user, checked, isSignedIn, restore, signIn, signOut, expire, allows }
})
