import { mkdirSync, rmSync } from 'node:fs'
import { rm } from 'node:fs/promises'
import type { NextFunction, Request, RequestHandler, Response } from 'express'
import multer from 'multer'
import { AppError } from '../errors/app-error'

function megabytes(bytes: number): string {
  return bytes >= 1024 * 1024 ? `${Math.round((bytes / 1024 / 1024) * 10) / 10} MB` : `${bytes} bytes`
}

function uploadError(error: unknown, maxBytes: number): unknown {
  if (!(error instanceof multer.MulterError)) return error
  if (error.code === 'LIMIT_FILE_SIZE') {
    return new AppError(413, 'file_too_large', `The file is larger than ${megabytes(maxBytes)}, the most one import takes.`)
  }
  if (error.code === 'LIMIT_UNEXPECTED_FILE' || error.code === 'LIMIT_FILE_COUNT') {
    return AppError.badRequest('Send one CSV file, in the form field "file".')
  }
  return AppError.badRequest(`The upload was not understood: ${error.message}.`)
}

/**
 * One CSV file in the form field `file`, written to a temporary file (so a
 * large upload is streamed, not held in memory) and refused past the size
 * limit. The file is removed when the request ends.
 */
export function csvUpload(maxBytes: number, dir: string): RequestHandler {
  // The folder is this server's own: what a crash left in it is cleared at start-up.
  rmSync(dir, { recursive: true, force: true })
  mkdirSync(dir, { recursive: true })
  const single = multer({
    dest: dir,
    defParamCharset: 'utf8',
    limits: { fileSize: maxBytes, files: 1, fields: 10, fieldSize: 1024 },
  }).single('file')
  return (req: Request, res: Response, next: NextFunction) => {
    // However the request ends (answered, aborted, failed), its file goes.
    res.on('close', () => {
      if (req.file) void rm(req.file.path, { force: true })
    })
    single(req, res, (error?: unknown) => next(error ? uploadError(error, maxBytes) : undefined))
  }
}
