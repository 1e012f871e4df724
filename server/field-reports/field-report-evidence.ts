import { chunks, placeholders, type Database } from '../db/database'

export type LinkEvidence = { confirmed: number; contradicted: number }

/** How many approved field reports confirm or contradict each link, for the answers that show links. */
export class FieldReportEvidence {
  constructor(private readonly db: Database) {}

  async forLinks(linkIds: readonly number[]): Promise<Map<number, LinkEvidence>> {
    const counts = new Map<number, LinkEvidence>()
    for (const ids of chunks([...new Set(linkIds)])) {
      const rows = await this.db.all<{ linkId: number; confirmed: number; contradicted: number }>(
        `SELECT "linkId", CAST(SUM("agrees") AS INTEGER) AS "confirmed", CAST(SUM(1 - "agrees") AS INTEGER) AS "contradicted"
           FROM field_report_link WHERE "linkId" IN (${placeholders(ids.length)}) GROUP BY "linkId"`,
        ids,
      )
      for (const row of rows) counts.set(row.linkId, { confirmed: row.confirmed, contradicted: row.contradicted })
    }
    return counts
  }
}
