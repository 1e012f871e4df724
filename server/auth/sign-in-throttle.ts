import { ipKeyGenerator } from 'express-rate-limit'
import type { DataSource } from 'typeorm'
import { databaseOf } from '../db/sqlite-connection'
import { SignInThrottleRepository } from './sign-in-throttle.repository'

const WINDOW_MS = 15 * 60 * 1000

export type ThrottleLimits = {
  /** Failed sign-ins per address and e-mail in a quarter of an hour. */
  perAccount: number
  /** Failed sign-ins per address across all e-mails in a quarter of an hour. */
  perAddress: number
  now?: () => number
}

/** When the caller may try again. */
export type Lockout = { retryAfterSeconds: number; retryAt: Date; scope: 'account' | 'address' }

/**
 * Slows password guessing: per address and e-mail, and per address across
 * e-mails, so one address cannot try many accounts. Successful sign-ins do not
 * count, and clear that account's failures.
 */
export class SignInThrottle {
  private readonly now: () => number

  constructor(
    private readonly counts: SignInThrottleRepository,
    private readonly limits: ThrottleLimits,
  ) {
    this.now = limits.now ?? Date.now
  }

  private keys(ip: string, email: string) {
    const address = ipKeyGenerator(ip)
    return { address: `address|${address}`, account: `account|${address}|${email.trim().toLowerCase()}` }
  }

  async lockout(ip: string, email: string): Promise<Lockout | null> {
    const keys = this.keys(ip, email)
    const now = this.now()
    const checks = [
      { scope: 'account' as const, key: keys.account, limit: this.limits.perAccount },
      { scope: 'address' as const, key: keys.address, limit: this.limits.perAddress },
    ]
    for (const check of checks) {
      const count = await this.counts.find(check.key)
      const endsAt = count ? count.windowStartedAt + WINDOW_MS : 0
      if (count && endsAt > now && count.failures >= check.limit) {
        return { scope: check.scope, retryAt: new Date(endsAt), retryAfterSeconds: Math.ceil((endsAt - now) / 1000) }
      }
    }
    return null
  }

  async recordFailure(ip: string, email: string): Promise<void> {
    const keys = this.keys(ip, email)
    const now = this.now()
    await this.counts.addFailure(keys.account, now, now - WINDOW_MS)
    await this.counts.addFailure(keys.address, now, now - WINDOW_MS)
  }

  async recordSuccess(ip: string, email: string): Promise<void> {
    await this.counts.clear(this.keys(ip, email).account)
  }
}

export function createSignInThrottle(dataSource: DataSource, limits: ThrottleLimits): SignInThrottle {
  return new SignInThrottle(new SignInThrottleRepository(databaseOf(dataSource)), limits)
}

/** What a locked-out caller reads: when to try again, in minutes and as a time of day (UTC, the server cannot know the caller's zone). */
export function lockoutMessage(lockout: Lockout): string {
  const minutes = Math.max(1, Math.ceil(lockout.retryAfterSeconds / 60))
  const at = lockout.retryAt.toISOString().slice(11, 16)
  const who = lockout.scope === 'address' ? 'from this address' : 'for this account'
  return `Too many failed sign-ins ${who}. Try again in ${minutes} minute${minutes === 1 ? '' : 's'} (at ${at} UTC), or ask an administrator to reset the password.`
}
