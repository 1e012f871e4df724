import type { Request, Response } from 'express'
import type { ImportProgress, ImportResult, ImportStreamLine } from '../../shared/schemas/imports'
import { errorAnswer } from '../errors/error-handler'

export const NDJSON = 'application/x-ndjson'

export function wantsProgress(req: Request): boolean {
  return (req.get('accept') ?? '').includes(NDJSON)
}

/**
 * Answers an import as newline-delimited JSON: progress lines while the file is
 * read and written, then one line with the status and body the plain JSON
 * answer would have had. The HTTP status is 200 once streaming has begun, so
 * the last line carries the real one.
 */
export async function streamImport(
  res: Response,
  run: (onProgress: (progress: ImportProgress) => void) => Promise<ImportResult>,
): Promise<void> {
  res.status(200).type(NDJSON)
  res.setHeader('Cache-Control', 'no-store')
  res.setHeader('X-Accel-Buffering', 'no')
  res.flushHeaders()
  const send = (line: ImportStreamLine) => res.write(`${JSON.stringify(line)}\n`)
  try {
    const result = await run((progress) => send(progress))
    send({ type: 'result', status: result.batchId === undefined ? 200 : 201, body: result })
  } catch (error) {
    send({ type: 'error', ...errorAnswer(error) })
  }
  res.end()
}
