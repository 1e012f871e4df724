import { z } from 'zod'
import { newPasswordSchema, userCreateSchema } from './auth'

/** An administrator invites someone by name, e-mail and role; the person chooses their own password from the mail's link. */
export const userInviteSchema = userCreateSchema.omit({ password: true })
export type UserInviteInput = z.infer<typeof userInviteSchema>

export const forgotPasswordSchema = z.object({
  email: z.string().trim().toLowerCase().pipe(z.email('Enter a valid e-mail address.')),
})
export type ForgotPasswordInput = z.infer<typeof forgotPasswordSchema>

/** The token from a mailed link: 32 random bytes, base64url. */
const token = z
  .string()
  .trim()
  .regex(/^[\w-]{20,100}$/, 'This link is not complete; open it again from the mail.')

export const passwordLinkSchema = z.object({ token })
export type PasswordLinkInput = z.infer<typeof passwordLinkSchema>

export const ACCOUNT_LINK_PURPOSES = ['invite', 'reset'] as const

/** What a link is for, shown before the person chooses a password. */
export const passwordLinkInfoSchema = z.object({
  purpose: z.enum(ACCOUNT_LINK_PURPOSES),
  email: z.string(),
  name: z.string(),
})
export type PasswordLinkInfo = z.infer<typeof passwordLinkInfoSchema>

export const setPasswordSchema = z.object({ token, password: newPasswordSchema })
export type SetPasswordInput = z.infer<typeof setPasswordSchema>

export const setPasswordAnswerSchema = z.object({ email: z.string() })

export const changePasswordSchema = z.object({
  currentPassword: z.string().min(1, 'Enter your current password.').max(200),
  password: newPasswordSchema,
})
export type ChangePasswordInput = z.infer<typeof changePasswordSchema>

export const forgotPasswordAnswerSchema = z.object({ message: z.string() })
