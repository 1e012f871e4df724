import { z } from 'zod'

export const OUTBOX_STATUSES = ['queued', 'sent', 'failed'] as const
export const outboxStatusSchema = z.enum(OUTBOX_STATUSES)

/** One message of the outbox as an administrator sees it; one-time links are shown cut short. */
export const outboxMessageSchema = z.object({
  id: z.number().int(),
  kind: z.string(),
  recipient: z.string(),
  subject: z.string(),
  text: z.string(),
  status: outboxStatusSchema,
  attempts: z.number().int(),
  lastError: z.string(),
  nextAttemptAt: z.string(),
  sentAt: z.string().nullable(),
  createdAt: z.string(),
})
export type OutboxMessage = z.infer<typeof outboxMessageSchema>

export const outboxQuerySchema = z.object({
  page: z.coerce.number().int().min(1, 'Pages start at 1.').max(100_000).default(1),
  pageSize: z.coerce.number().int().min(1).max(100, 'At most 100 a page.').default(25),
  status: outboxStatusSchema.optional(),
})
export type OutboxQuery = z.infer<typeof outboxQuerySchema>

export const outboxPageSchema = z.object({ items: z.array(outboxMessageSchema), total: z.number().int() })
export type OutboxPage = z.infer<typeof outboxPageSchema>
