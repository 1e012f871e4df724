import { z } from 'zod'

/** One shape for every error answer of the API, so the client needs one check. */
export const fieldErrorSchema = z.object({
  path: z.string(),
  message: z.string(),
})

export const errorResponseSchema = z.object({
  error: z.object({
    code: z.string(),
    message: z.string(),
    details: z.array(fieldErrorSchema).optional(),
  }),
})

export type FieldError = z.infer<typeof fieldErrorSchema>
export type ErrorResponse = z.infer<typeof errorResponseSchema>
