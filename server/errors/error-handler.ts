import type { NextFunction, Request, Response } from 'express'
import { ZodError } from 'zod'
import type { ErrorResponse } from '../../shared/schemas/errors'
import { AppError } from './app-error'

function send(res: Response, status: number, body: ErrorResponse) {
  res.status(status).json(body)
}

/** Field messages of a zod error, with the path written the way a form names a field. */
export function zodDetails(error: ZodError) {
  return error.issues.map((issue) => ({
    path: issue.path.map(String).join('.'),
    message: issue.message,
  }))
}

/** Maps every error to the one JSON shape; unknown errors are logged, never shown. */
export function errorHandler(error: unknown, _req: Request, res: Response, next: NextFunction) {
  if (res.headersSent) return next(error)
  if (error instanceof AppError) {
    return send(res, error.status, { error: { code: error.code, message: error.message, details: error.details } })
  }
  if (error instanceof ZodError) {
    return send(res, 400, {
      error: { code: 'validation_failed', message: 'Some fields are not valid.', details: zodDetails(error) },
    })
  }
  const httpError = error as { status?: number; type?: string; expose?: boolean; message?: string }
  if (httpError.type === 'entity.parse.failed') {
    return send(res, 400, { error: { code: 'malformed_json', message: 'The request body is not valid JSON.' } })
  }
  if (httpError.type === 'entity.too.large') {
    return send(res, 413, { error: { code: 'too_large', message: 'The request body is too large.' } })
  }
  if (typeof httpError.status === 'number' && httpError.status >= 400 && httpError.status < 500 && httpError.expose) {
    return send(res, httpError.status, { error: { code: 'bad_request', message: httpError.message ?? 'Bad request.' } })
  }
  console.error('Unhandled error:', error)
  return send(res, 500, { error: { code: 'internal', message: 'Something went wrong on our side. It has been logged.' } })
}

export function notFoundApi(_req: Request, res: Response) {
  send(res, 404, { error: { code: 'not_found', message: 'No such API route.' } })
}
