import { mkdirSync, rmSync } from 'node:fs'
import { rm } from 'node:fs/promises'
import type { NextFunction, Request, RequestHandler, Response } from 'express'
import multer from 'multer'
import { FIELD_REPORT_MAX_PHOTOS } from '../../shared/schemas/field-reports'
import { AppError } from '../errors/app-error'

/** What the photos go with, for the messages: a field report (with its `report` field) or a stock unit. */
export type PhotoUploadFor = 'report' | 'unit'

function uploadError(error: unknown, maxBytes: number, target: PhotoUploadFor): unknown {
  if (!(error instanceof multer.MulterError)) return error
  const mb = Math.round((maxBytes / 1024 / 1024) * 10) / 10
  const messages: Partial<Record<multer.ErrorCode, [number, string]>> = {
    LIMIT_FILE_SIZE: [413, `A photo is larger than ${mb} MB, the most one photo may be.`],
    LIMIT_FILE_COUNT: [400, `Send at most ${FIELD_REPORT_MAX_PHOTOS} photos with one ${target}.`],
    LIMIT_UNEXPECTED_FILE: [
      400,
      target === 'report'
        ? 'Send photos in the form field "photos" and the report as the field "report".'
        : 'Send photos in the form field "photos".',
    ],
    LIMIT_FIELD_VALUE: [413, 'The report field is too long.'],
  }
  const [status, message] = messages[error.code] ?? [400, `The upload was not understood: ${error.message}.`]
  return new AppError(status, 'bad_upload', message)
}

/**
 * Photos as multipart (for a report, beside its `report` JSON field): up to eight `photos`,
 * each streamed to a temporary file; the files go when the answer has been sent.
 */
export function photoUpload(maxBytes: number, dir: string, target: PhotoUploadFor = 'report'): RequestHandler {
  // The folder is this server's own: what a crash left in it is cleared at start-up.
  rmSync(dir, { recursive: true, force: true })
  mkdirSync(dir, { recursive: true })
  const fields = multer({
    dest: dir,
    defParamCharset: 'utf8',
    limits: { fileSize: maxBytes, files: FIELD_REPORT_MAX_PHOTOS, fields: 2, fieldSize: 256 * 1024 },
  }).array('photos', FIELD_REPORT_MAX_PHOTOS)
  return (req: Request, res: Response, next: NextFunction) => {
    const cleanUp = () => {
      const files = (req.files as Express.Multer.File[] | undefined) ?? []
      void Promise.all(files.map((file) => rm(file.path, { force: true })))
    }
    res.on('close', cleanUp)
    fields(req, res, (error?: unknown) => next(error ? uploadError(error, maxBytes, target) : undefined))
  }
}
