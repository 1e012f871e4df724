import { ipKeyGenerator } from 'express-rate-limit'
import type { SignInThrottleRepository } from './sign-in-throttle.repository'

const WINDOW_MS = 60 * 60 * 1000

export type ResetLimits = {
  /** Reset mails to one e-mail address in an hour. */
  perEmail: number
  /** Reset requests from one address in an hour, whatever e-mail they name. */
  perAddress: number
  now?: () => number
}

/**
 * Keeps "forgot password" from flooding someone's inbox or being used to
 * probe many addresses. Counts go in the sign-in throttle's table under keys
 * of their own, so a restart forgets nothing.
 */
export class ResetThrottle {
  private readonly now: () => number

  constructor(
    private readonly counts: SignInThrottleRepository,
    private readonly limits: ResetLimits,
  ) {
    this.now = limits.now ?? Date.now
  }

  /** Counts one request; answers how long the address must wait, or null, and whether a mail to this e-mail may go. */
  async record(ip: string, email: string): Promise<{ retryAfterSeconds: number | null; mayMail: boolean }> {
    const now = this.now()
    const address = `reset|address|${ipKeyGenerator(ip)}`
    const mailbox = `reset|email|${email}`
    const addressCount = await this.counts.find(address)
    if (addressCount && addressCount.windowStartedAt + WINDOW_MS > now && addressCount.failures >= this.limits.perAddress) {
      return { retryAfterSeconds: Math.ceil((addressCount.windowStartedAt + WINDOW_MS - now) / 1000), mayMail: false }
    }
    await this.counts.addFailure(address, now, now - WINDOW_MS)
    const mailboxCount = await this.counts.find(mailbox)
    const mailboxFull = !!mailboxCount && mailboxCount.windowStartedAt + WINDOW_MS > now && mailboxCount.failures >= this.limits.perEmail
    if (!mailboxFull) await this.counts.addFailure(mailbox, now, now - WINDOW_MS)
    return { retryAfterSeconds: null, mayMail: !mailboxFull }
  }
}
