import { userSchema, type LoginInput } from '@shared/schemas/auth'
import { csrfHeader, refreshCsrfToken, request, requestVoid } from './http'

export const authApi = {
  me: () => request('GET', '/auth/me', userSchema),
  /** Signing in needs a CSRF token too: the sign-in page asks for one first when it has none. */
  async login(input: LoginInput) {
    if (Object.keys(csrfHeader()).length === 0) await refreshCsrfToken()
    return request('POST', '/auth/login', userSchema, { body: input })
  },
  logout: () => requestVoid('POST', '/auth/logout'),
}
