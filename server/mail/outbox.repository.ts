import type { Database } from '../db/database'
import type { OutboxStatus } from './mail-outbox.entity'

export type OutboxRow = {
  id: number
  kind: string
  recipient: string
  subject: string
  text: string
  html: string
  status: OutboxStatus
  attempts: number
  lastError: string
  nextAttemptAt: unknown
  sentAt: unknown
  createdAt: unknown
}
export type NewMessage = { kind: string; recipient: string; subject: string; text: string; html: string }

const FIELDS =
  '"id", "kind", "recipient", "subject", "text", "html", "status", "attempts", "lastError", "nextAttemptAt", "sentAt", "createdAt"'
const COLUMNS = `SELECT ${FIELDS} FROM mail_outbox`

/** The mail_outbox table. */
export class OutboxRepository {
  constructor(private readonly db: Database) {}

  enqueue(message: NewMessage, now: Date): Promise<number> {
    return this.db.insert(
      'INSERT INTO mail_outbox ("kind", "recipient", "subject", "text", "html", "status", "attempts", "lastError", "nextAttemptAt", "createdAt") VALUES (?, ?, ?, ?, ?, \'queued\', 0, \'\', ?, ?) RETURNING "id"',
      [message.kind, message.recipient, message.subject, message.text, message.html, now, now],
    )
  }

  /**
   * Takes up to `limit` messages that are due and holds them until `heldUntil`,
   * in one statement, so two servers on one database never send the same
   * message (the second one's update finds them no longer due). A server that
   * dies mid-send leaves its messages to be sent again once the hold runs out.
   */
  async claimDue(now: Date, limit: number, heldUntil: Date): Promise<OutboxRow[]> {
    const rows = await this.db.all<OutboxRow>(
      `UPDATE mail_outbox SET "nextAttemptAt" = ?
         WHERE "id" IN (SELECT "id" FROM mail_outbox WHERE "status" = 'queued' AND "nextAttemptAt" <= ? ORDER BY "id" LIMIT ?)
           AND "status" = 'queued' AND "nextAttemptAt" <= ?
         RETURNING ${FIELDS}`,
      [heldUntil, now, limit, now],
    )
    return rows.sort((a, b) => a.id - b.id)
  }

  async markSent(id: number, now: Date): Promise<void> {
    await this.db.run(
      'UPDATE mail_outbox SET "status" = \'sent\', "sentAt" = ?, "attempts" = "attempts" + 1, "lastError" = \'\' WHERE "id" = ?',
      [now, id],
    )
  }

  async markFailed(id: number, error: string, next: Date | null): Promise<void> {
    await this.db.run(
      'UPDATE mail_outbox SET "status" = ?, "attempts" = "attempts" + 1, "lastError" = ?, "nextAttemptAt" = COALESCE(?, "nextAttemptAt") WHERE "id" = ?',
      [next ? 'queued' : 'failed', error.slice(0, 500), next, id],
    )
  }

  /** When a message of this kind was last queued, to keep digests to one an hour. */
  async lastQueued(kind: string): Promise<unknown> {
    return (await this.db.get<{ at: unknown }>('SELECT MAX("createdAt") AS "at" FROM mail_outbox WHERE "kind" = ?', [kind]))?.at ?? null
  }

  async page(offset: number, limit: number, status?: OutboxStatus) {
    const where = status ? 'WHERE "status" = ?' : ''
    const filter = status ? [status] : []
    const rows = await this.db.all<OutboxRow>(`${COLUMNS} ${where} ORDER BY "id" DESC LIMIT ? OFFSET ?`, [...filter, limit, offset])
    const total = await this.db.get<{ total: number }>(`SELECT CAST(COUNT(*) AS INTEGER) AS "total" FROM mail_outbox ${where}`, filter)
    return { rows, total: total?.total ?? 0 }
  }

  /** Replaces a message's bodies (to drop a one-time link once it is no longer needed). */
  async rewrite(id: number, text: string, html: string): Promise<void> {
    await this.db.run('UPDATE mail_outbox SET "text" = ?, "html" = ? WHERE "id" = ?', [text, html, id])
  }
}
