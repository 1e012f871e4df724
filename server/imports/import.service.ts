import type { DataSource } from 'typeorm'
import type { ImportBatch, ImportPhase, ImportProgress, ImportResult } from '../../shared/schemas/imports'
import { ImportBatchEntity } from '../audit/import-batch.entity'
import { SecurityEventService } from '../security/security-events.service'
import type { FitGraphIndex } from '../fitment/fit-graph'
import type { StockIndex } from '../stock/stock-index'
import type { Touched } from './import-jobs'
import type { ImportJobInput, ImportUser } from './import-job'
import { importRunner, type ImportRunner } from './worker/import-runner'

export type { ImportUser } from './import-job'

export type ImportRun = ImportJobInput & { onProgress?: (progress: ImportProgress) => void }

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
 * CSV imports of parts, links, vehicles and stock, and reverts of their
 * batches. The import worker reads, checks, plans and writes (one
 * transaction, all or nothing) off the event loop; here the batch's delta
 * goes to the fit graph and stock indexes and the security event is recorded.
 */
export class ImportService {
  private readonly runner: ImportRunner
  private readonly events: SecurityEventService

  constructor(
    private readonly dataSource: DataSource,
    private readonly limits: { maxRows: number },
    private readonly graphIndex: FitGraphIndex,
    /** The app's stock index, refreshed after stock imports and reverts (absent where a tool imports catalogue only). */
    private readonly stockIndex?: StockIndex,
  ) {
    this.events = new SecurityEventService(dataSource)
    this.runner = importRunner(dataSource)
  }

  private securityEvent(kind: 'import' | 'revert', user: ImportUser, detail: string) {
    return this.events.record({ kind, actorId: user.id, actorEmail: user.email ?? null, address: user.address ?? null, detail })
  }

  async run({ onProgress, ...input }: ImportRun): Promise<ImportResult> {
    let last = 0
    const report = (phase: ImportPhase, done: number, total: number) => {
      const now = Date.now()
      if (phase === 'read' && done < total && now - last < 100) return
      last = now
      onProgress?.({ type: 'progress', phase, done, total })
    }
    const job = await this.runner.import(input, this.limits.maxRows, report)
    if (!job.touched) return job.answer
    await this.afterWrite(job.touched)
    await this.securityEvent('import', input.user, `batch ${job.answer.batchId}: ${input.type} from ${input.fileName}`)
    report('write', job.written ?? 0, job.written ?? 0)
    return job.answer
  }

  private async afterWrite(touched: Touched) {
    await this.graphIndex.applyChanges(touched.catalogue)
    if (touched.stockParts.length) await this.stockIndex?.refresh(touched.stockParts)
  }

  /** Ends the import worker (shutdown); an import still running is not written. */
  close(): Promise<void> {
    return this.runner.close()
  }

  /** Where imports run (the import worker, or inline): exports read the catalogue there too, and tests end its worker part-way. */
  get jobRunner(): ImportRunner {
    return this.runner
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
    const touched = await this.runner.revert(batchId, user.name)
    await this.afterWrite(touched)
    await this.securityEvent('revert', user, `batch ${batchId}`)
    return toImportBatch(await this.dataSource.getRepository(ImportBatchEntity).findOneByOrFail({ id: batchId }))
  }
}
