import type { Database } from '../db/database'
import type { Role } from '../../shared/schemas/auth'
import type { AccountTokenPurpose } from './account-token.entity'

/** A link's token row with the account it opens. */
export type TokenHolder = {
  tokenId: number
  purpose: AccountTokenPurpose
  userId: number
  email: string
  name: string
  disabledAt: unknown
}

/** The account_token table, and the password writes that go with using a token. */
export class AccountTokenRepository {
  constructor(private readonly db: Database) {}

  /** A new invited user with no password yet; answers the id. */
  insertInvitedUser(tx: Database, input: { email: string; name: string; role: Role }, now: Date): Promise<number> {
    return tx.insert('INSERT INTO "user" ("email", "name", "role", "passwordHash", "createdAt") VALUES (?, ?, ?, \'\', ?) RETURNING "id"', [
      input.email,
      input.name,
      input.role,
      now,
    ])
  }

  async emailTaken(tx: Database, email: string): Promise<boolean> {
    return (await tx.get('SELECT "id" FROM "user" WHERE "email" = ?', [email])) !== undefined
  }

  async findUser(email: string): Promise<{ id: number; name: string; email: string; disabledAt: unknown } | undefined> {
    return this.db.get('SELECT "id", "name", "email", "disabledAt" FROM "user" WHERE "email" = ?', [email])
  }

  async userById(id: number): Promise<{ id: number; name: string; email: string; passwordHash: string; disabledAt: unknown } | undefined> {
    return this.db.get('SELECT "id", "name", "email", "passwordHash", "disabledAt" FROM "user" WHERE "id" = ?', [id])
  }

  /** A new link; any earlier unused link of the same user stops working, so only the newest mail counts. */
  async issue(tx: Database, input: { userId: number; purpose: AccountTokenPurpose; tokenHash: string; expiresAt: Date }, now: Date) {
    await tx.run('UPDATE "account_token" SET "usedAt" = ? WHERE "userId" = ? AND "usedAt" IS NULL', [now, input.userId])
    await tx.insert(
      'INSERT INTO "account_token" ("userId", "purpose", "tokenHash", "expiresAt", "createdAt") VALUES (?, ?, ?, ?, ?) RETURNING "id"',
      [input.userId, input.purpose, input.tokenHash, input.expiresAt, now],
    )
  }

  /** The holder of a link that is unused and not expired. */
  findUsable(tokenHash: string, now: Date): Promise<TokenHolder | undefined> {
    return this.db.get<TokenHolder>(
      `SELECT t."id" AS "tokenId", t."purpose", u."id" AS "userId", u."email", u."name", u."disabledAt"
       FROM "account_token" t JOIN "user" u ON u."id" = t."userId"
       WHERE t."tokenHash" = ? AND t."usedAt" IS NULL AND t."expiresAt" > ?`,
      [tokenHash, now],
    )
  }

  /**
   * Uses the link and sets the password in one transaction; answers false when
   * another request used the link first (so it works exactly once).
   */
  async usePassword(tokenId: number, userId: number, passwordHash: string, now: Date): Promise<boolean> {
    return this.db.transaction(async (tx) => {
      const { changes } = await tx.run('UPDATE "account_token" SET "usedAt" = ? WHERE "id" = ? AND "usedAt" IS NULL AND "expiresAt" > ?', [
        now,
        tokenId,
        now,
      ])
      if (changes !== 1) return false
      await tx.run('UPDATE "user" SET "passwordHash" = ? WHERE "id" = ?', [passwordHash, userId])
      await this.retireForUser(tx, userId, now)
      return true
    })
  }

  /** A changed password makes every link still out for the user worthless. */
  async retireForUser(tx: Database, userId: number, now: Date): Promise<void> {
    await tx.run('UPDATE "account_token" SET "usedAt" = ? WHERE "userId" = ? AND "usedAt" IS NULL', [now, userId])
  }

  async setPassword(userId: number, passwordHash: string, now: Date): Promise<void> {
    await this.db.transaction(async (tx) => {
      await tx.run('UPDATE "user" SET "passwordHash" = ? WHERE "id" = ?', [passwordHash, userId])
      await this.retireForUser(tx, userId, now)
    })
  }
}
