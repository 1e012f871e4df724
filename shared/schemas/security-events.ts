import { z } from 'zod'

export const SECURITY_EVENT_KINDS = [
  'sign_in',
  'sign_in_failed',
  'password_change',
  'role_change',
  'disable',
  'enable',
  'invite',
  'password_reset_request',
  'password_reset',
  'import',
  'revert',
] as const
export const securityEventKindSchema = z.enum(SECURITY_EVENT_KINDS)
export type SecurityEventKind = z.infer<typeof securityEventKindSchema>

export const securityEventSchema = z.object({
  id: z.number().int(),
  kind: securityEventKindSchema,
  at: z.string(),
  /** Who did it: the signed-in user, or for a failed sign-in the e-mail that was tried. */
  actorId: z.number().int().nullable(),
  actorEmail: z.string().nullable(),
  /** The address the request came from. */
  address: z.string().nullable(),
  /** What it was done to and how, in a few words (the user changed, the batch, the new role). */
  detail: z.string().nullable(),
})
export type SecurityEvent = z.infer<typeof securityEventSchema>

export const securityEventQuerySchema = z.object({
  page: z.coerce.number().int().min(1, 'Pages start at 1.').max(100_000).default(1),
  pageSize: z.coerce.number().int().min(1).max(200, 'At most 200 a page.').default(50),
  kind: securityEventKindSchema.optional(),
})
export type SecurityEventQuery = z.infer<typeof securityEventQuerySchema>

export const securityEventPageSchema = z.object({
  events: z.array(securityEventSchema),
  total: z.number().int(),
  page: z.number().int(),
  pageSize: z.number().int(),
})
export type SecurityEventPage = z.infer<typeof securityEventPageSchema>
