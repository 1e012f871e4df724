import { userSchema, type LoginInput } from '@shared/schemas/auth'
import { request, requestVoid } from './http'

export const authApi = {
  me: () => request('GET', '/auth/me', userSchema),
  login: (input: LoginInput) => request('POST', '/auth/login', userSchema, { body: input }),
  logout: () => requestVoid('POST', '/auth/logout'),
}
