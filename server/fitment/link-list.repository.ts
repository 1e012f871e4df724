import type { Link, LinkList } from '../../shared/schemas/link'
import type { ReviewStatus } from '../../shared/schemas/fitment'
import { chunks, placeholders, toIsoTime, type Database, type SqlValue } from '../db/database'

type LinkListRow = Omit<Link, 'modifications' | 'createdAt' | 'updatedAt'> & { createdAt: unknown; updatedAt: unknown }
export type LinkListFilter = { status?: ReviewStatus; partId?: number; contradicted?: boolean }

const LINK_COLUMNS = `SELECT l."id", a."partNumber" AS "from", b."partNumber" AS "to", l."relation", l."note", l."source", l."status",
  l."createdAt", l."updatedAt",
  (SELECT CAST(COUNT(*) AS INTEGER) FROM field_report_link e WHERE e."linkId" = l."id" AND e."agrees" = 0) AS "contradictedBy"
  FROM link l JOIN part a ON a."id" = l."partAId" JOIN part b ON b."id" = l."partBId"`

/** The editor's list of links (review, contradicted by the field, by part), with their modification names; portable SQL. */
export class LinkListRepository {
  constructor(private readonly db: Database) {}

  async page(filter: LinkListFilter, offset: number, limit: number): Promise<LinkList> {
    const where: string[] = []
    const params: SqlValue[] = []
    if (filter.contradicted) where.push('l."id" IN (SELECT e."linkId" FROM field_report_link e WHERE e."agrees" = 0)')
    if (filter.status) {
      where.push('l."status" = ?')
      params.push(filter.status)
    }
    if (filter.partId !== undefined) {
      where.push('(l."partAId" = ? OR l."partBId" = ?)')
      params.push(filter.partId, filter.partId)
    }
    const clause = where.length ? ` WHERE ${where.join(' AND ')}` : ''
    const total = await this.db.get<{ total: number }>(`SELECT CAST(COUNT(*) AS INTEGER) AS "total" FROM link l${clause}`, params)
    const rows = await this.db.all<LinkListRow>(`${LINK_COLUMNS}${clause} ORDER BY l."updatedAt" DESC, l."id" DESC LIMIT ? OFFSET ?`, [
      ...params,
      limit,
      offset,
    ])
    return { items: await this.withModifications(rows), total: total?.total ?? 0 }
  }

  async byId(id: number): Promise<Link | undefined> {
    const rows = await this.db.all<LinkListRow>(`${LINK_COLUMNS} WHERE l."id" = ?`, [id])
    return (await this.withModifications(rows))[0]
  }

  private async withModifications(rows: LinkListRow[]): Promise<Link[]> {
    const names = new Map<number, string[]>()
    for (const ids of chunks(rows.map((row) => row.id))) {
      const found = await this.db.all<{ linkId: number; name: string }>(
        `SELECT lm."linkId", m."name" FROM link_modification lm JOIN modification m ON m."id" = lm."modificationId"
          WHERE lm."linkId" IN (${placeholders(ids.length)})`,
        ids,
      )
      for (const { linkId, name } of found) names.set(linkId, [...(names.get(linkId) ?? []), name])
    }
    return rows.map((row) => ({
      ...row,
      modifications: (names.get(row.id) ?? []).sort(),
      contradictedBy: Number(row.contradictedBy ?? 0),
      createdAt: toIsoTime(row.createdAt),
      updatedAt: toIsoTime(row.updatedAt),
    }))
  }
}
