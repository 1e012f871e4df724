import type { FieldError } from '../../shared/schemas/errors'

/** The one error type services throw; the error handler turns it into a JSON answer. */
export class AppError extends Error {
  constructor(
    readonly status: number,
    readonly code: string,
    message: string,
    readonly details?: FieldError[],
  ) {
    super(message)
    this.name = 'AppError'
  }

  static badRequest(message: string, details?: FieldError[]) {
    return new AppError(400, 'bad_request', message, details)
  }

  static notFound(message: string) {
    return new AppError(404, 'not_found', message)
  }

  static conflict(message: string, details?: FieldError[]) {
    return new AppError(409, 'conflict', message, details)
  }
}
