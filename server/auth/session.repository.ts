import type { Database } from '../db/database'

export type SessionRow = { id: string; userId: number | null; data: string; expiresAt: number; startedAt: number }

type StoredRow = { id: string; userId: number | null; data: string; expiresAt: number | string; startedAt: number | string }

/** The session rows; PostgreSQL hands bigints back as text, so times are turned into numbers here. */
export class SessionRepository {
  constructor(private readonly db: Database) {}

  async find(id: string): Promise<SessionRow | undefined> {
    const row = await this.db.get<StoredRow>('SELECT "id", "userId", "data", "expiresAt", "startedAt" FROM "user_session" WHERE "id" = ?', [
      id,
    ])
    return row && { ...row, expiresAt: Number(row.expiresAt), startedAt: Number(row.startedAt) }
  }

  /** Writes a session; its start time is kept from the first write. */
  async save(row: SessionRow): Promise<void> {
    await this.db.run(
      `INSERT INTO "user_session" ("id", "userId", "data", "expiresAt", "startedAt") VALUES (?, ?, ?, ?, ?)
       ON CONFLICT ("id") DO UPDATE SET "userId" = excluded."userId", "data" = excluded."data", "expiresAt" = excluded."expiresAt"`,
      [row.id, row.userId, row.data, row.expiresAt, row.startedAt],
    )
  }

  async touch(id: string, expiresAt: number): Promise<void> {
    await this.db.run('UPDATE "user_session" SET "expiresAt" = ? WHERE "id" = ?', [expiresAt, id])
  }

  async remove(id: string): Promise<void> {
    await this.db.run('DELETE FROM "user_session" WHERE "id" = ?', [id])
  }

  /** Ends every session of a user, but the one given (the user's own request, when they change their own password). */
  async removeForUser(userId: number, exceptId?: string): Promise<number> {
    const { changes } = await this.db.run('DELETE FROM "user_session" WHERE "userId" = ? AND "id" <> ?', [userId, exceptId ?? ''])
    return changes
  }

  async removeEnded(now: number, startedBefore: number): Promise<void> {
    await this.db.run('DELETE FROM "user_session" WHERE "expiresAt" <= ? OR "startedAt" <= ?', [now, startedBefore])
  }
}
