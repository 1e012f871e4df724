import { createReadStream } from 'node:fs'
import type { DataSource } from 'typeorm'
import type { ImportBatch, ImportMode, ImportPhase, ImportProgress, ImportResult, ImportType } from '../../shared/schemas/imports'
import { CsvFileError, readCsvStream, type CsvReadSummary } from './csv/csv-stream'
import { inTransaction, sqliteConnection } from '../db/sqlite-connection'
import { ImportBatchEntity } from '../audit/import-batch.entity'
import { SecurityEventService } from '../security/security-events.service'
import { AppError } from '../errors/app-error'
import type { FitGraphIndex } from '../fitment/fit-graph'
import type { StockIndex } from '../stock/stock-index'
import { importWork, type Planned, type Touched, type Work } from './import-jobs'
import { insertBatch } from '../audit/change-log'
import { LISTED } from './import-change-list'
import { issueDetails } from './import-issues'
import { PreviewCache } from './import-preview-cache'
import { revertBatch } from '../audit/revert'

/** Who imports or reverts; e-mail and address go to the security events. */
export type ImportUser = { id: number | null; name: string; email?: string; address?: string }

export type ImportRun = {
  filePath: string
  fileName: string
  fileSize: number
  type: ImportType
  mode: ImportMode
  validRowsOnly: boolean
  user: ImportUser
  onProgress?: (progress: ImportProgress) => void
}

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

export function toImportBatch(entity: ImportBatchEntity): ImportBatch {
  return {
    id: entity.id,
    type: entity.type,
    fileName: entity.fileName,
    fileHash: entity.fileHash,
    userName: entity.userName,
    createdAt: entity.createdAt.toISOString(),
    counts: { created: entity.created, updated: entity.updated, unchanged: entity.unchanged, rejected: entity.rejected },
    validRowsOnly: entity.validRowsOnly,
    status: entity.status,
    revertedAt: entity.revertedAt ? entity.revertedAt.toISOString() : null,
    revertedByName: entity.revertedByName,
  }
}

/**
 * CSV imports of parts, links, vehicles and stock: read and check the file as it streams in,
 * then plan against the catalogue and (on commit) write everything in one
 * transaction as a recorded, revertible batch.
 */
export class ImportService {
  private readonly previews = new PreviewCache<Work>()

  constructor(
    private readonly dataSource: DataSource,
    private readonly limits: { maxRows: number },
    private readonly graphIndex: FitGraphIndex,
    /** The app's stock index, refreshed after stock imports and reverts (absent where a tool imports catalogue only). */
    private readonly stockIndex?: StockIndex,
  ) {
    this.events = new SecurityEventService(dataSource)
  }

  private readonly events: SecurityEventService

  private securityEvent(kind: 'import' | 'revert', user: ImportUser, detail: string) {
    return this.events.record({ kind, actorId: user.id, actorEmail: user.email ?? null, address: user.address ?? null, detail })
  }

  private async read(input: ImportRun, report: (phase: ImportPhase, done: number, total: number) => void) {
    const work = importWork(input.type)
    const summary = await readCsvStream(createReadStream(input.filePath, { highWaterMark: 1 << 20 }), {
      maxRows: this.limits.maxRows,
      onHeader: (cells, row) => work.rows.onHeader(cells, row),
      onRow: (cells, row) => work.rows.onRow(cells, row),
      onProgress: (bytes) => report('read', bytes, input.fileSize),
    }).catch((error: unknown) => {
      throw fileError(error)
    })
    return { work, summary }
  }

  async run(input: ImportRun): Promise<ImportResult> {
    let last = 0
    const report = (phase: ImportPhase, done: number, total: number) => {
      const now = Date.now()
      if (phase === 'read' && done < total && now - last < 100) return
      last = now
      input.onProgress?.({ type: 'progress', phase, done, total })
    }
    const userId = input.user.id
    if (input.mode === 'preview') {
      const { work, summary } = await this.read(input, report)
      this.previews.put(userId, input.type, work, summary)
      report('check', 0, summary.rows)
      return result(work.plan(sqliteConnection(this.dataSource)))
    }
    const cached = await this.previews.match(userId, input.type, input.filePath, input.fileSize)
    const { work, summary }: { work: Work; summary: CsvReadSummary } = cached ?? (await this.read(input, report))
    report('read', input.fileSize, input.fileSize)
    report('write', 0, summary.rows)
    const committed = await inTransaction(this.dataSource, (db) => {
      const planned = work.plan(db)
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
      const batchId = insertBatch(db, {
        type: input.type,
        fileName: input.fileName,
        fileHash: summary.sha256,
        user: input.user,
        counts,
        validRowsOnly: rejected > 0,
      })
      return { answer: result(planned, batchId), touched: planned.write(batchId) }
    })
    this.previews.drop(userId, input.type)
    await this.afterWrite(committed.touched)
    await this.securityEvent('import', input.user, `batch ${committed.answer.batchId}: ${input.type} from ${input.fileName}`)
    report('write', summary.rows, summary.rows)
    return committed.answer
  }

  private async afterWrite(touched: Touched) {
    await this.graphIndex.applyChanges(touched.catalogue)
    if (touched.stockParts.length) await this.stockIndex?.refresh(touched.stockParts)
  }

  async list(): Promise<ImportBatch[]> {
    const batches = await this.dataSource.getRepository(ImportBatchEntity).find({ order: { id: 'DESC' } })
    return batches.map(toImportBatch)
  }

  /** One batch, or undefined when there is none with that id. */
  async batch(batchId: number): Promise<ImportBatch | undefined> {
    const entity = await this.dataSource.getRepository(ImportBatchEntity).findOneBy({ id: batchId })
    return entity ? toImportBatch(entity) : undefined
  }

  /** Restores the catalogue as it was before the batch, or says which later write stands in the way. */
  async revert(batchId: number, user: ImportUser): Promise<ImportBatch> {
    const touched = await inTransaction(this.dataSource, (db) => revertBatch(db, batchId, user.name))
    await this.afterWrite(touched)
    await this.securityEvent('revert', user, `batch ${batchId}`)
    return toImportBatch(await this.dataSource.getRepository(ImportBatchEntity).findOneByOrFail({ id: batchId }))
  }
}
