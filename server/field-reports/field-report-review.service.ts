import type { DataSource } from 'typeorm'
import type { Database } from '../db/database'
import type { FieldReport } from '../../shared/schemas/field-reports'
import type { User } from '../../shared/schemas/auth'
import { databaseOf } from '../db/sqlite-connection'
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
    const outcome = await databaseOf(this.dataSource).transaction(async (db) => {
      const written = await approvePairs(db, id, report.pairs, editor)
      await this.decide(db, id, 'approved', note, editor, written.batchId)
      return written
    })
    await this.graphIndex.applyChanges({ links: [...outcome.created, ...outcome.confirmed] })
    const { batchId, ...links } = outcome
    return { report: await this.told(id, 'approved', note, editor), links, batchId }
  }

  async reject(id: number, reason: string, editor: User): Promise<FieldReport> {
    await this.open(id, editor)
    await this.decide(databaseOf(this.dataSource), id, 'rejected', reason, editor, null)
    return this.told(id, 'rejected', reason, editor)
  }

  async ask(id: number, question: string, editor: User): Promise<FieldReport> {
    await this.open(id, editor)
    await this.decide(databaseOf(this.dataSource), id, 'needs-more', question, editor, null)
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

  private async decide(
    db: Database,
    id: number,
    status: 'approved' | 'rejected' | 'needs-more',
    note: string,
    editor: User,
    batchId: number | null,
  ) {
    // Checked again in the same statement: two editors deciding at once must not both win.
    const changed = await db.run(
      `UPDATE field_report SET "status" = ?, "decisionNote" = ?, "decidedByName" = ?, "decidedAt" = ?, "batchId" = ?
         WHERE "id" = ? AND "status" IN ('submitted', 'needs-more')`,
      [status, note, editor.name, new Date(), batchId, id],
    )
    if (changed.changes === 0) throw new AppError(409, 'already_decided', `Field report ${id} was decided meanwhile.`)
  }
}
