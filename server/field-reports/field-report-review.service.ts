import type Database from 'better-sqlite3'
import type { DataSource } from 'typeorm'
import { SQL_NOW } from '../audit/change-log'
import type { FieldReport } from '../../shared/schemas/field-reports'
import type { User } from '../../shared/schemas/auth'
import { inTransaction } from '../db/sqlite-connection'
import { AppError } from '../errors/app-error'
import type { FitGraphIndex } from '../fitment/fit-graph'
import { approvePairs, type ApprovalOutcome } from './field-report-review'
import type { FieldReportService } from './field-report.service'
import type { FieldReportNotices } from './field-report-notices'

const OPEN = ['submitted', 'needs-more']

/** An editor's decision on a report: approve (pairs become reviewed links), reject with a reason, or ask for more. */
export class FieldReportReviewService {
  constructor(
    private readonly dataSource: DataSource,
    private readonly reports: FieldReportService,
    private readonly graphIndex: FitGraphIndex,
    private readonly notices: FieldReportNotices,
  ) {}

  async approve(
    id: number,
    note: string,
    editor: User,
  ): Promise<{ report: FieldReport; links: Omit<ApprovalOutcome, 'batchId'>; batchId: number }> {
    const report = await this.open(id, editor)
    const outcome = await inTransaction(this.dataSource, (db) => {
      const written = approvePairs(db, id, report.pairs, editor)
      this.decide(db, id, 'approved', note, editor, written.batchId)
      return written
    })
    await this.graphIndex.applyChanges({ links: [...outcome.created, ...outcome.confirmed] })
    const { batchId, ...links } = outcome
    return { report: await this.told(id, 'approved', note, editor), links, batchId }
  }

  async reject(id: number, reason: string, editor: User): Promise<FieldReport> {
    await this.open(id, editor)
    await inTransaction(this.dataSource, (db) => this.decide(db, id, 'rejected', reason, editor, null))
    return this.told(id, 'rejected', reason, editor)
  }

  async ask(id: number, question: string, editor: User): Promise<FieldReport> {
    await this.open(id, editor)
    await inTransaction(this.dataSource, (db) => this.decide(db, id, 'needs-more', question, editor, null))
    return this.told(id, 'needs-more', question, editor)
  }

  /** The decided report, after queueing the reporter's mail (a mail problem never undoes the decision). */
  private async told(id: number, status: 'approved' | 'rejected' | 'needs-more', note: string, editor: User): Promise<FieldReport> {
    const report = await this.reports.get(id, editor)
    await this.notices
      .decided(report, status, note)
      .catch((error: unknown) => console.error(`Queueing mail for report ${id} failed:`, error))
    return report
  }

  private async open(id: number, editor: User): Promise<FieldReport> {
    const report = await this.reports.get(id, editor)
    if (!OPEN.includes(report.status)) {
      throw new AppError(409, 'already_decided', `Field report ${id} is already ${report.status}; revert its batch to decide again.`)
    }
    return report
  }

  private decide(
    db: Database.Database,
    id: number,
    status: 'approved' | 'rejected' | 'needs-more',
    note: string,
    editor: User,
    batchId: number | null,
  ) {
    // Checked again inside the transaction: two editors deciding at once must not both win.
    const changed = db
      .prepare(
        `UPDATE field_report SET "status" = ?, "decisionNote" = ?, "decidedByName" = ?, "decidedAt" = ${SQL_NOW}, "batchId" = ?
           WHERE "id" = ? AND "status" IN ('submitted', 'needs-more')`,
      )
      .run(status, note, editor.name, batchId, id)
    if (changed.changes === 0) throw new AppError(409, 'already_decided', `Field report ${id} was decided meanwhile.`)
  }
}
