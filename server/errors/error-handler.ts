import type { NextFunction, Request, Response } from 'express'
import { ZodError } from 'zod'
import type { ErrorResponse } from '../../shared/schemas/errors'
import { AppError } from './app-error'

/** Every error answer stays small, however much the request gave to complain about. */
export const MAX_ERROR_DETAILS = 20
export const MAX_ERROR_TEXT = 500

const clip = (text: string) => (text.length > MAX_ERROR_TEXT ? `${text.slice(0, MAX_ERROR_TEXT - 1)}…` : text)

/** The body with at most MAX_ERROR_DETAILS details and every text clipped. */
export function smallError(body: ErrorResponse): ErrorResponse {
  const { code, message, details } = body.error
  const error: ErrorResponse['error'] = { code, message: clip(message) }
  if (details) {
    error.details = details
      .slice(0, MAX_ERROR_DETAILS)
      .map((detail) => ({ ...detail, path: clip(detail.path), message: clip(detail.message) }))
  }
  return { error }
}

function send(res: Response, status: number, body: ErrorResponse) {
  res.status(status).json(smallError(body))
}

/** Field messages of a zod error, with the path written the way a form names a field. */
export function zodDetails(error: ZodError) {
  return error.issues.map((issue) => ({
    path: issue.path.map(String).join('.'),
    message: issue.message,
  }))
}

/** The status and body every error is answered with; unknown errors are logged, never shown. */
export function errorAnswer(error: unknown): { status: number; body: ErrorResponse } {
  if (error instanceof AppError) {
    return { status: error.status, body: { error: { code: error.code, message: error.message, details: error.details } } }
  }
  if (error instanceof ZodError) {
    return {
      status: 400,
      body: { error: { code: 'validation_failed', message: 'Some fields are not valid.', details: zodDetails(error) } },
    }
  }
  const httpError = error as { status?: number; type?: string; expose?: boolean; message?: string }
  if (httpError.type === 'entity.parse.failed') {
    return { status: 400, body: { error: { code: 'malformed_json', message: 'The request body is not valid JSON.' } } }
  }
  if (httpError.type === 'entity.too.large') {
    return { status: 413, body: { error: { code: 'too_large', message: 'The request body is too large.' } } }
  }
  if (typeof httpError.status === 'number' && httpError.status >= 400 && httpError.status < 500) {
    // Client errors raised by Express itself (a malformed percent-encoding in the path, say); their text is not always meant for users.
    const message = httpError.expose && httpError.message ? httpError.message : 'The request could not be read.'
    return { status: httpError.status, body: { error: { code: 'bad_request', message } } }
  }
  console.error('Unhandled error:', error)
  return { status: 500, body: { error: { code: 'internal', message: 'Something went wrong on our side. It has been logged.' } } }
}

/** The one error handler: every error becomes the one JSON shape. */
export function errorHandler(error: unknown, _req: Request, res: Response, next: NextFunction) {
  if (res.headersSent) return next(error)
  const { status, body } = errorAnswer(error)
  send(res, status, body)
}

export function notFoundApi(_req: Request, res: Response) {
  send(res, 404, { error: { code: 'not_found', message: 'No such API route.' } })
}
