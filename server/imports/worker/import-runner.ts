import type { DataSource } from 'typeorm'
import { revertBatch } from '../../audit/revert'
import type { Database } from '../../db/database'
import { databaseOf } from '../../db/sqlite-connection'
import { ImportJobs, type ImportJobInput, type ImportJobResult, type Report } from '../import-job'
import type { Touched } from '../import-jobs'
import { ImportWorker } from './import-worker-client'
import { exportCsv } from '../export.service'
import type { ExportFile } from '../../../shared/schemas/imports'

/** Where imports and reverts run: in the import worker, or on the main thread where no worker can open the database. */
export interface ImportRunner {
  import(input: ImportJobInput, maxRows: number, report: Report): Promise<ImportJobResult>
  revert(batchId: number, userName: string): Promise<Touched>
  /** An export file, read where the imports run. */
  export(file: ExportFile): Promise<string>
  close(): Promise<void>
}

export class WorkerRunner implements ImportRunner {
  readonly worker: ImportWorker

  constructor(dbPath: string) {
    this.worker = new ImportWorker(dbPath)
  }

  async import(input: ImportJobInput, maxRows: number, report: Report) {
    const value = await this.worker.run({ kind: 'import', input, maxRows }, (progress) =>
      report(progress.phase, progress.done, progress.total),
    )
    return value as ImportJobResult
  }

  async revert(batchId: number, userName: string) {
    return (await this.worker.run({ kind: 'revert', batchId, userName })) as Touched
  }

  async export(file: ExportFile) {
    return (await this.worker.run({ kind: 'export', file })) as string
  }

  close() {
    return this.worker.close()
  }
}

/**
 * The same jobs through the main thread's data port: for an in-memory SQLite
 * database (a worker cannot open it) and PostgreSQL, where every statement is
 * a round trip to the server, so the event loop stays free while they run.
 */
export class InlineRunner implements ImportRunner {
  private readonly jobs: ImportJobs
  private readonly db: Database

  constructor(dataSource: DataSource) {
    this.db = databaseOf(dataSource)
    this.jobs = new ImportJobs(this.db)
  }

  import(input: ImportJobInput, maxRows: number, report: Report) {
    return this.jobs.run(input, maxRows, report)
  }

  revert(batchId: number, userName: string) {
    return this.db.transaction((tx) => revertBatch(tx, batchId, userName))
  }

  async export(file: ExportFile) {
    return this.db.snapshot((tx) => exportCsv(tx, file))
  }

  async close() {}
}

export function importRunner(dataSource: DataSource): ImportRunner {
  const { type, database } = dataSource.options
  if (type === 'better-sqlite3' && typeof database === 'string' && database !== ':memory:' && database !== '') {
    return new WorkerRunner(database)
  }
  return new InlineRunner(dataSource)
}
