import { createReadStream } from 'node:fs'
import type { Database } from '../db/database'
import type { ImportMode, ImportPhase, ImportResult, ImportType } from '../../shared/schemas/imports'
import { CsvFileError, readCsvStream, type CsvReadSummary } from './csv/csv-stream'
import { AppError } from '../errors/app-error'
import { importWork, type Planned, type Touched, type Work } from './import-jobs'
import { recordBatch } from '../audit/change-log'
import { LISTED } from './import-change-list'
import { issueDetails } from './import-issues'
import { PreviewCache } from './import-preview-cache'

/** Who imports or reverts; e-mail and address go to the security events. */
export type ImportUser = { id: number | null; name: string; email?: string; address?: string }

/** One import as the job runner gets it: plain data, so it can cross to the import worker. */
export type ImportJobInput = {
  filePath: string
  fileName: string
  fileSize: number
  type: ImportType
  mode: ImportMode
  validRowsOnly: boolean
  user: ImportUser
}

export type Report = (phase: ImportPhase, done: number, total: number) => void

/** What an import job answers: the result, and on commit what it touched, for the indexes on the main thread. */
export type ImportJobResult = { answer: ImportResult; touched?: Touched; written?: number }

function fileError(error: unknown): unknown {
  if (!(error instanceof CsvFileError)) return error
  const status = error.problem === 'too_many_rows' ? 413 : 400
  const code = {
    empty: 'empty_file',
    binary: 'not_text',
    malformed: 'malformed_csv',
    too_many_rows: 'too_many_rows',
    header_too_long: 'header_too_long',
  }[error.problem]
  return new AppError(status, code, error.message)
}

function result(planned: Planned, batchId?: number): ImportResult {
  return {
    ...(batchId === undefined ? {} : { batchId }),
    counts: planned.changes.counts,
    errors: planned.errors.slice(0, LISTED.errors),
    changes: planned.changes.listed,
    omitted: { errors: Math.max(0, planned.errors.length - LISTED.errors), changes: planned.changes.omitted },
  }
}

/** Reports the write phase as records written of records to write, a few times a second at most. */
function writeReporter(report: Report, total: number) {
  let done = 0
  let last = 0
  return () => {
    done++
    if ((done & 255) !== 0 && done !== total) return
    const now = Date.now()
    if (done !== total && now - last < 100) return
    last = now
    report('write', done, total)
  }
}

/**
 * Reads, checks, plans and (on commit) writes one CSV import: the work of one
 * job, the same in the import worker and, where there is no worker (an
 * in-memory database, PostgreSQL), on the main thread.
 */
export class ImportJobs {
  private readonly previews = new PreviewCache<Work>()

  /** `db`: the import worker's own SQLite connection, or the main thread's port (in-memory SQLite, PostgreSQL). */
  constructor(private readonly db: Database) {}

  private async read(input: ImportJobInput, maxRows: number, report: Report) {
    const work = importWork(input.type)
    const summary = await readCsvStream(createReadStream(input.filePath, { highWaterMark: 1 << 20 }), {
      maxRows,
      onHeader: (cells, row) => work.rows.onHeader(cells, row),
      onRow: (cells, row) => work.rows.onRow(cells, row),
      onProgress: (bytes) => report('read', bytes, input.fileSize),
    }).catch((error: unknown) => {
      throw fileError(error)
    })
    return { work, summary }
  }

  async run(input: ImportJobInput, maxRows: number, report: Report): Promise<ImportJobResult> {
    const userId = input.user.id
    if (input.mode === 'preview') {
      const { work, summary } = await this.read(input, maxRows, report)
      this.previews.put(userId, input.type, work, summary)
      report('check', 0, summary.rows)
      return { answer: result(await work.plan(this.db)) }
    }
    const cached = await this.previews.match(userId, input.type, input.filePath, input.fileSize)
    const { work, summary }: { work: Work; summary: CsvReadSummary } = cached ?? (await this.read(input, maxRows, report))
    report('read', input.fileSize, input.fileSize)
    report('check', 0, summary.rows)
    const committed = await this.db.transaction(async (db) => {
      const planned = await work.plan(db)
      const { counts } = planned.changes
      const { created, updated, unchanged, rejected } = counts
      if (rejected > 0 && !input.validRowsOnly) {
        throw new AppError(
          422,
          'rows_rejected',
          `${rejected} of ${summary.rows} rows have errors, so nothing was written. Fix them, or commit only the valid rows.`,
          issueDetails(planned.errors.slice(0, 100)),
        )
      }
      if (created + updated + unchanged === 0) throw new AppError(422, 'nothing_valid', 'No row of the file is valid; nothing was written.')
      const now = new Date()
      const batchId = await recordBatch(
        db,
        {
          type: input.type,
          fileName: input.fileName,
          fileHash: summary.sha256,
          user: input.user,
          counts,
          validRowsOnly: rejected > 0,
        },
        now,
      )
      report('write', 0, planned.writes)
      const touched = await planned.write(batchId, now, writeReporter(report, planned.writes))
      return { answer: result(planned, batchId), touched, written: planned.writes }
    })
    this.previews.drop(userId, input.type)
    return committed
  }
}
