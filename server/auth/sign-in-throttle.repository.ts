import type { Database } from '../db/database'

export type ThrottleCount = { failures: number; windowStartedAt: number }

export class SignInThrottleRepository {
  constructor(private readonly db: Database) {}

  async find(key: string): Promise<ThrottleCount | undefined> {
    const row = await this.db.get<{ failures: number; windowStartedAt: number | string }>(
      'SELECT "failures", "windowStartedAt" FROM "sign_in_throttle" WHERE "key" = ?',
      [key],
    )
    return row && { failures: Number(row.failures), windowStartedAt: Number(row.windowStartedAt) }
  }

  /** One more failure; a window that began before `windowFrom` starts again at `now`. */
  async addFailure(key: string, now: number, windowFrom: number): Promise<void> {
    await this.db.run(
      `INSERT INTO "sign_in_throttle" ("key", "failures", "windowStartedAt") VALUES (?, 1, ?)
       ON CONFLICT ("key") DO UPDATE SET
         "failures" = CASE WHEN "sign_in_throttle"."windowStartedAt" <= ? THEN 1 ELSE "sign_in_throttle"."failures" + 1 END,
         "windowStartedAt" = CASE WHEN "sign_in_throttle"."windowStartedAt" <= ? THEN ? ELSE "sign_in_throttle"."windowStartedAt" END`,
      [key, now, windowFrom, windowFrom, now],
    )
  }

  async clear(key: string): Promise<void> {
    await this.db.run('DELETE FROM "sign_in_throttle" WHERE "key" = ?', [key])
  }
}
