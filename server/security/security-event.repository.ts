import { toIsoTime, type Database } from '../db/database'
import type { SecurityEvent, SecurityEventKind } from '../../shared/schemas/security-events'

export type NewSecurityEvent = {
  kind: SecurityEventKind
  actorId?: number | null
  actorEmail?: string | null
  address?: string | null
  detail?: string | null
}

type Stored = Omit<SecurityEvent, 'at'> & { at: unknown }

export class SecurityEventRepository {
  constructor(private readonly db: Database) {}

  async insert(event: NewSecurityEvent, at: Date): Promise<void> {
    await this.db.run(
      'INSERT INTO "security_event" ("kind", "at", "actorId", "actorEmail", "address", "detail") VALUES (?, ?, ?, ?, ?, ?)',
      [event.kind, at, event.actorId ?? null, event.actorEmail ?? null, event.address ?? null, event.detail ?? null],
    )
  }

  /** Newest first. */
  async page(options: { kind?: SecurityEventKind; limit: number; offset: number }): Promise<{ events: SecurityEvent[]; total: number }> {
    const where = options.kind ? 'WHERE "kind" = ?' : ''
    const filter = options.kind ? [options.kind] : []
    const rows = await this.db.all<Stored>(
      `SELECT "id", "kind", "at", "actorId", "actorEmail", "address", "detail" FROM "security_event" ${where} ORDER BY "id" DESC LIMIT ? OFFSET ?`,
      [...filter, options.limit, options.offset],
    )
    const count = await this.db.get<{ total: number }>(`SELECT CAST(COUNT(*) AS INTEGER) AS "total" FROM "security_event" ${where}`, filter)
    return { events: rows.map((row) => ({ ...row, at: toIsoTime(row.at) })), total: Number(count?.total ?? 0) }
  }
}
