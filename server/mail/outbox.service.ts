import { toIsoTime } from '../db/database'
import type { Mailer } from './mailer'
import type { NewMessage, OutboxRepository, OutboxRow } from './outbox.repository'
import type { OutboxStatus } from './mail-outbox.entity'

/** Waits before the next try after 1, 2, 3... failures; after the last a message is marked failed, never dropped. */
const RETRY_MINUTES = [1, 5, 15, 60, 240]
const BATCH = 20
/** A one-time link's token in a message (set-password links); see `withoutTokens`. */
const TOKEN = /#token=[\w-]+/g

/**
 * A message's text with its one-time tokens cut out: what an administrator
 * reads, and what is kept once the message is sent or given up on, so the
 * outbox never holds a working link longer than it must.
 */
export function withoutTokens(text: string): string {
  return text.replace(TOKEN, '#token=(removed)')
}

export type OutboxMessage = Omit<OutboxRow, 'nextAttemptAt' | 'sentAt' | 'createdAt' | 'html'> & {
  nextAttemptAt: string
  sentAt: string | null
  createdAt: string
}

/**
 * Mail goes through an outbox: a request only queues a row, and delivery runs
 * apart from requests, with retries, so a slow or refusing SMTP server never
 * holds anyone up and no message is lost.
 */
/** How long a server holds the messages it took to send; past that another server may send them. */
const HOLD_MS = 10 * 60_000

export class OutboxService {
  private timer: NodeJS.Timeout | null = null
  private running: Promise<number> | null = null

  constructor(
    private readonly repository: OutboxRepository,
    private readonly mailer: Mailer,
    private readonly clock: () => Date = () => new Date(),
  ) {}

  enqueue(message: NewMessage): Promise<number> {
    return this.repository.enqueue(message, this.clock())
  }

  /** Sends what is due; answers how many went. One run at a time. */
  deliverDue(): Promise<number> {
    this.running ??= this.deliver().finally(() => (this.running = null))
    return this.running
  }

  /** Starts delivering in the background (the server does; tests call deliverDue). */
  start(everyMs = 5_000, beforeEach?: () => Promise<void>) {
    if (this.timer) return
    this.timer = setInterval(() => {
      void (async () => {
        await beforeEach?.()
        await this.deliverDue()
      })().catch((error: unknown) => console.error('Mail delivery run failed:', error))
    }, everyMs)
    this.timer.unref()
  }

  async stop(): Promise<void> {
    if (this.timer) clearInterval(this.timer)
    this.timer = null
    await this.running
    await this.mailer.close()
  }

  async list(page: number, pageSize: number, status?: OutboxStatus): Promise<{ items: OutboxMessage[]; total: number }> {
    const { rows, total } = await this.repository.page((page - 1) * pageSize, pageSize, status)
    return {
      items: rows.map(({ html: _html, ...row }) => ({
        ...row,
        text: withoutTokens(row.text),
        nextAttemptAt: toIsoTime(row.nextAttemptAt),
        sentAt: row.sentAt ? toIsoTime(row.sentAt) : null,
        createdAt: toIsoTime(row.createdAt),
      })),
      total,
    }
  }

  private async deliver(): Promise<number> {
    let sent = 0
    const now = this.clock()
    for (const row of await this.repository.claimDue(now, BATCH, new Date(now.getTime() + HOLD_MS))) {
      try {
        await this.mailer.send({ to: row.recipient, subject: row.subject, text: row.text, html: row.html })
        await this.repository.markSent(row.id, this.clock())
        await this.forgetTokens(row)
        sent++
      } catch (error) {
        const wait = RETRY_MINUTES[row.attempts]
        const next = wait === undefined ? null : new Date(this.clock().getTime() + wait * 60_000)
        await this.repository.markFailed(row.id, error instanceof Error ? error.message : String(error), next)
        if (!next) await this.forgetTokens(row)
      }
    }
    return sent
  }

  private async forgetTokens(row: OutboxRow) {
    const text = withoutTokens(row.text)
    const html = withoutTokens(row.html)
    if (text !== row.text || html !== row.html) await this.repository.rewrite(row.id, text, html)
  }
}
