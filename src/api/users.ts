import { userListSchema, userSchema, type UserCreateInput, type UserUpdateInput } from '@shared/schemas/auth'
import { request } from './http'

export const usersApi = {
  list: (signal?: AbortSignal) => request('GET', '/users', userListSchema, { signal }),
  create: (input: UserCreateInput) => request('POST', '/users', userSchema, { body: input }),
  update: (id: number, change: UserUpdateInput) => request('PATCH', `/users/${id}`, userSchema, { body: change }),
}
