import { userSchema } from '@shared/schemas/auth'
import {
  forgotPasswordAnswerSchema,
  passwordLinkInfoSchema,
  setPasswordAnswerSchema,
  type ChangePasswordInput,
  type SetPasswordInput,
  type UserInviteInput,
} from '@shared/schemas/accounts'
import { ensureCsrfToken as withToken, request, requestVoid } from './http'

export const accountsApi = {
  /** One's own home site (null for none): stock answers name it first. */
  setHomeSite: (homeSiteId: number | null) => request('PUT', '/account/home-site', userSchema, { body: { homeSiteId } }),
  invite: (input: UserInviteInput) => request('POST', '/users/invite', userSchema, { body: input }),
  inviteAgain: (id: number) => request('POST', `/users/${id}/invite`, userSchema),
  async forgotPassword(email: string) {
    await withToken()
    return request('POST', '/auth/forgot-password', forgotPasswordAnswerSchema, { body: { email } })
  },
  async linkInfo(token: string) {
    await withToken()
    return request('POST', '/auth/password-link', passwordLinkInfoSchema, { body: { token } })
  },
  async setPassword(input: SetPasswordInput) {
    await withToken()
    return request('POST', '/auth/set-password', setPasswordAnswerSchema, { body: input })
  },
  changePassword: (input: ChangePasswordInput) => requestVoid('POST', '/auth/change-password', { body: input }),
}
