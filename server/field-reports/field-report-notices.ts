import type { FieldReport } from '../../shared/schemas/field-reports'
import { can } from '../../shared/permissions'
import { toIsoTime, type Database } from '../db/database'
import type { OutboxService } from '../mail/outbox.service'
import type { OutboxRepository } from '../mail/outbox.repository'
import type { UserService } from '../users/user.service'
import type { FieldReportService } from './field-report.service'
import { reportDecidedMessage, reportsWaitingMessage } from './field-report-mail'

const DIGEST = 'reports-waiting'
const HOUR = 60 * 60_000

/** The mail field reports cause: the reporter hears of each decision; editors get one digest an hour at most. */
export class FieldReportNotices {
  constructor(
    private readonly outbox: OutboxService,
    private readonly outboxRows: OutboxRepository,
    private readonly users: UserService,
    private readonly reports: FieldReportService,
    private readonly publicUrl: string,
    private readonly db: Database,
    private readonly clock: () => Date = () => new Date(),
  ) {}

  async decided(report: FieldReport, status: 'approved' | 'rejected' | 'needs-more', note: string): Promise<void> {
    if (report.reporter.id === null) return
    const reporter = await this.users.findById(report.reporter.id)
    if (!reporter) return
    await this.outbox.enqueue({
      kind: 'report-decided',
      recipient: reporter.email,
      ...reportDecidedMessage(report, status, note, this.publicUrl),
    })
  }

  /** Queues a digest when reports came in since the last one and that one is an hour old; answers how many went out. */
  digest(): Promise<number> {
    // Every server runs this on its beat; on one shared database only one of them at a time, so editors get one digest.
    return this.db.exclusively(DIGEST, () => this.queueDigest())
  }

  private async queueDigest(): Promise<number> {
    const last = await this.outboxRows.lastQueued(DIGEST)
    const lastAt = last ? new Date(toIsoTime(last)).getTime() : 0
    if (this.clock().getTime() - lastAt < HOUR) return 0
    const waiting = await this.reports.waitingForReview(100)
    const fresh = waiting.filter((report) => new Date(report.createdAt).getTime() > lastAt)
    if (fresh.length === 0) return 0
    const reviewers = (await this.users.list()).filter((user) => !user.disabled && can(user.role, 'field-reports.review'))
    for (const reviewer of reviewers) {
      await this.outbox.enqueue({
        kind: DIGEST,
        recipient: reviewer.email,
        ...reportsWaitingMessage(reviewer.name, waiting, this.publicUrl),
      })
    }
    return reviewers.length
  }
}
