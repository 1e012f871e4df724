import type { FieldError } from '../../../shared/schemas/errors'
import type { ExportFile, ImportPhase } from '../../../shared/schemas/imports'
import { AppError } from '../../errors/app-error'
import type { ImportJobInput } from '../import-job'

/** The work of one job, as the main thread asks for it. */
export type JobWork =
  | { kind: 'import'; input: ImportJobInput; maxRows: number }
  | { kind: 'revert'; batchId: number; userName: string }
  | { kind: 'export'; file: ExportFile }
  | { kind: 'close' }

/** A job for the import worker: the work, on which database file. */
export type JobRequest = JobWork & { id: number; dbPath: string }

/** An error as it crosses from the worker: an AppError keeps its status, code and details. */
export type SentError =
  { app: { status: number; code: string; message: string; details?: FieldError[] } } | { message: string; stack?: string }

export type JobReply =
  | { id: number; type: 'progress'; phase: ImportPhase; done: number; total: number }
  | { id: number; type: 'done'; value: unknown }
  | { id: number; type: 'failed'; error: SentError }

export function sendableError(error: unknown): SentError {
  if (error instanceof AppError) {
    return { app: { status: error.status, code: error.code, message: error.message, ...(error.details ? { details: error.details } : {}) } }
  }
  return error instanceof Error ? { message: error.message, stack: error.stack } : { message: String(error) }
}

/** The error back on the main thread: an AppError as thrown, anything else as an unknown error (a logged 500). */
export function receivedError(sent: SentError): Error {
  if ('app' in sent) return new AppError(sent.app.status, sent.app.code, sent.app.message, sent.app.details)
  const error = new Error(`Import worker: ${sent.message}`)
  if (sent.stack) error.stack = `Import worker: ${sent.stack}`
  return error
}
