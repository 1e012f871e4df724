import type { FieldReportStatus } from '../../shared/schemas/field-reports'
import { chunks, placeholders, type Database } from '../db/database'

export type FieldReportRow = {
  id: number
  reporterId: number | null
  reporterName: string
  status: FieldReportStatus
  body: string
  warnings: string
  decidedByName: string | null
  decidedAt: unknown
  decisionNote: string
  createdAt: unknown
}
export type FieldReportPhotoRow = {
  id: number
  reportId: number
  position: number
  displayKey: string
  thumbKey: string
  width: number
  height: number
}
export type NewPhoto = { displayKey: string; thumbKey: string; width: number; height: number }

const COLUMNS =
  'SELECT "id", "reporterId", "reporterName", "status", "body", "warnings", "decidedByName", "decidedAt", "decisionNote", "createdAt" FROM field_report'

/** The field_report and field_report_photo tables. */
export class FieldReportRepository {
  constructor(private readonly db: Database) {}

  /** The report and its photos in one transaction: both are written or neither. */
  insert(report: { reporterId: number | null; reporterName: string; body: string; warnings: string }, photos: NewPhoto[]): Promise<number> {
    return this.db.transaction(async (tx) => {
      const id = await tx.insert(
        'INSERT INTO field_report ("reporterId", "reporterName", "status", "body", "warnings", "createdAt") VALUES (?, ?, ?, ?, ?, ?) RETURNING "id"',
        [report.reporterId, report.reporterName, 'submitted', report.body, report.warnings, new Date()],
      )
      for (const [position, photo] of photos.entries()) {
        await tx.insert(
          'INSERT INTO field_report_photo ("reportId", "position", "displayKey", "thumbKey", "width", "height") VALUES (?, ?, ?, ?, ?, ?) RETURNING "id"',
          [id, position, photo.displayKey, photo.thumbKey, photo.width, photo.height],
        )
      }
      return id
    })
  }

  byId(id: number): Promise<FieldReportRow | undefined> {
    return this.db.get<FieldReportRow>(`${COLUMNS} WHERE "id" = ?`, [id])
  }

  /** Newest first; `reporterId` narrows to one reporter's own. */
  async page(filter: { status?: FieldReportStatus; reporterId?: number; pair?: [number, number] }, offset: number, limit: number) {
    const where: string[] = []
    const params: (string | number)[] = []
    if (filter.status) {
      where.push('"status" = ?')
      params.push(filter.status)
    }
    if (filter.reporterId !== undefined) {
      where.push('"reporterId" = ?')
      params.push(filter.reporterId)
    }
    if (filter.pair) {
      where.push(
        '"id" IN (SELECT e."reportId" FROM field_report_link e JOIN link l ON l."id" = e."linkId" WHERE l."partAId" = ? AND l."partBId" = ?)',
      )
      params.push(...filter.pair)
    }
    const clause = where.length ? ` WHERE ${where.join(' AND ')}` : ''
    const rows = await this.db.all<FieldReportRow>(`${COLUMNS}${clause} ORDER BY "id" DESC LIMIT ? OFFSET ?`, [...params, limit, offset])
    const total = await this.db.get<{ total: number }>(`SELECT CAST(COUNT(*) AS INTEGER) AS "total" FROM field_report${clause}`, params)
    return { rows, total: total?.total ?? 0 }
  }

  async photosOf(reportIds: readonly number[]): Promise<FieldReportPhotoRow[]> {
    const rows: FieldReportPhotoRow[] = []
    for (const ids of chunks(reportIds)) {
      rows.push(
        ...(await this.db.all<FieldReportPhotoRow>(
          `SELECT "id", "reportId", "position", "displayKey", "thumbKey", "width", "height" FROM field_report_photo WHERE "reportId" IN (${placeholders(ids.length)}) ORDER BY "reportId", "position"`,
          ids,
        )),
      )
    }
    return rows
  }

  photo(reportId: number, photoId: number): Promise<FieldReportPhotoRow | undefined> {
    return this.db.get<FieldReportPhotoRow>(
      'SELECT "id", "reportId", "position", "displayKey", "thumbKey", "width", "height" FROM field_report_photo WHERE "id" = ? AND "reportId" = ?',
      [photoId, reportId],
    )
  }

  /** Every stored key, for sweeping files no report owns. */
  async allKeys(): Promise<Set<string>> {
    const rows = await this.db.all<{ displayKey: string; thumbKey: string }>('SELECT "displayKey", "thumbKey" FROM field_report_photo')
    return new Set(rows.flatMap((row) => [row.displayKey, row.thumbKey]))
  }
}
