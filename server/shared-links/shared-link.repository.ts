import type { Database } from '../db/database'
import type { SharedLinkKind } from './shared-link.entity'

export type SharedLinkRow = {
  id: number
  kind: SharedLinkKind
  targetId: number
  expiresAt: unknown
  sharedBy: string
}

/** The shared_link table. */
export class SharedLinkRepository {
  constructor(private readonly db: Database) {}

  insert(
    tx: Database,
    link: { kind: SharedLinkKind; targetId: number; tokenHash: string; expiresAt: Date; sharedById: number; recipient: string },
    now: Date,
  ): Promise<number> {
    return tx.insert(
      'INSERT INTO "shared_link" ("kind", "targetId", "tokenHash", "expiresAt", "sharedById", "recipient", "createdAt") VALUES (?, ?, ?, ?, ?, ?, ?) RETURNING "id"',
      [link.kind, link.targetId, link.tokenHash, link.expiresAt, link.sharedById, link.recipient, now],
    )
  }

  /** The link with that token's hash, expired or not (the caller tells the two apart). */
  findByHash(tokenHash: string): Promise<SharedLinkRow | undefined> {
    return this.db.get<SharedLinkRow>(
      `SELECT l."id", l."kind", l."targetId", l."expiresAt", COALESCE(u."name", '') AS "sharedBy"
       FROM "shared_link" l LEFT JOIN "user" u ON u."id" = l."sharedById"
       WHERE l."tokenHash" = ?`,
      [tokenHash],
    )
  }
}
