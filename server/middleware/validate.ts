import type { Request } from 'express'
import type { z } from 'zod'

/*
 * Parse helpers for route handlers: a failed parse throws the ZodError, which the
 * error handler answers as 400 with the field messages.
 */
export function parseBody<S extends z.ZodType>(schema: S, req: Request): z.infer<S> {
  return schema.parse(req.body ?? {})
}

export function parseQuery<S extends z.ZodType>(schema: S, req: Request): z.infer<S> {
  return schema.parse(req.query)
}

export function parseParams<S extends z.ZodType>(schema: S, req: Request): z.infer<S> {
  return schema.parse(req.params)
}
