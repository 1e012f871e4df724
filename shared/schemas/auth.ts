import { z } from 'zod'

export const ROLES = ['admin', 'editor', 'counter', 'tech'] as const
export const roleSchema = z.enum(ROLES)
export type Role = z.infer<typeof roleSchema>

export const loginSchema = z.object({
  email: z.string().trim().toLowerCase().pipe(z.email('Enter a valid e-mail address.')),
  password: z.string().min(1, 'Enter your password.').max(200),
})
export type LoginInput = z.infer<typeof loginSchema>

export const userSchema = z.object({
  id: z.number().int(),
  email: z.string(),
  name: z.string(),
  role: roleSchema,
  /** A disabled account cannot sign in; an administrator can enable it again. */
  disabled: z.boolean(),
  /** Invited but has not set a password yet: the invitation link is the only way in. */
  invitePending: z.boolean().default(false),
  /** The site the user works at: stock answers name it first when it has the part. */
  homeSiteId: z.number().int().nullable().default(null),
})
export type User = z.infer<typeof userSchema>

export const ROLE_LABELS: Record<Role, string> = {
  admin: 'Administrator',
  editor: 'Catalogue editor',
  counter: 'Parts counter',
  tech: 'Technician',
}

/** bcrypt reads only the first 72 bytes, so a longer password would match others sharing them: refused instead. */
export const PASSWORD_MAX_BYTES = 72

/** A password someone chooses (the server also refuses common ones). */
export const newPasswordSchema = z
  .string()
  .min(10, 'Use at least 10 characters.')
  .refine(
    (value) => new TextEncoder().encode(value).length <= PASSWORD_MAX_BYTES,
    `Use at most ${PASSWORD_MAX_BYTES} bytes (about ${PASSWORD_MAX_BYTES} letters; accented letters and symbols count two to four).`,
  )

export const userCreateSchema = z.object({
  email: z.string().trim().toLowerCase().pipe(z.email('Enter a valid e-mail address.')),
  name: z.string().trim().min(1, 'Name is required.').max(120),
  role: roleSchema,
  password: newPasswordSchema,
})
export type UserCreateInput = z.infer<typeof userCreateSchema>

/** A site's id, or null for no home site. */
export const homeSiteIdSchema = z
  .number({ error: 'Give a site id, or null for none.' })
  .int()
  .positive('Give a site id, or null for none.')
  .nullable()
export const homeSiteSchema = z.strictObject({ homeSiteId: homeSiteIdSchema })
export type HomeSiteInput = z.infer<typeof homeSiteSchema>

export const userUpdateSchema = z
  .object({
    name: z.string().trim().min(1, 'Name is required.').max(120).optional(),
    role: roleSchema.optional(),
    password: newPasswordSchema.optional(),
    disabled: z.boolean().optional(),
    homeSiteId: homeSiteIdSchema.optional(),
  })
  .refine((value) => Object.keys(value).length > 0, 'Change at least one of name, role, password, disabled or home site.')
export type UserUpdateInput = z.infer<typeof userUpdateSchema>

export const userListSchema = z.array(userSchema)
