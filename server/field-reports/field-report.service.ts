import { readFile } from 'node:fs/promises'
import type { User } from '../../shared/schemas/auth'
import { can } from '../../shared/permissions'
import { validateVin } from '../../shared/engineering/vin'
import type { FieldReport, FieldReportInput, FieldReportList, FieldReportStatus } from '../../shared/schemas/field-reports'
import type { FieldError } from '../../shared/schemas/errors'
import { toIsoTime } from '../db/database'
import { AppError } from '../errors/app-error'
import type { PartService } from '../catalogue/part.service'
import type { FieldReportPhotoRow, FieldReportRepository, FieldReportRow, NewPhoto } from './field-report.repository'
import { processPhoto } from './photo-processing'
import { orderedPair } from '../fitment/link-rows'
import type { PhotoStorage } from './photo-storage'

export type UploadedPhoto = { path: string; originalName: string }
type Body = Pick<FieldReport, 'pairs' | 'vehicle' | 'measurements' | 'notes'>

function toReport(row: FieldReportRow, photos: FieldReportPhotoRow[]): FieldReport {
  const body = JSON.parse(row.body) as Body
  return {
    id: row.id,
    status: row.status,
    reporter: { id: row.reporterId, name: row.reporterName },
    createdAt: toIsoTime(row.createdAt),
    ...body,
    photos: photos.map((photo) => ({ id: photo.id, width: photo.width, height: photo.height })),
    warnings: JSON.parse(row.warnings) as string[],
    decision: row.decidedByName && row.decidedAt ? { by: row.decidedByName, at: toIsoTime(row.decidedAt), note: row.decisionNote } : null,
  }
}

/**
 * Field reports from the shop floor: checked against the catalogue, photos
 * re-encoded and stored, the report and its photos written together.
 */
export class FieldReportService {
  constructor(
    private readonly repository: FieldReportRepository,
    private readonly parts: PartService,
    private readonly storage: PhotoStorage,
  ) {}

  async file(input: FieldReportInput, uploads: UploadedPhoto[], user: User): Promise<FieldReport> {
    const pairs = await this.resolvePairs(input.pairs)
    const warnings = this.vinWarnings(input.vehicle?.vin)
    // Slow work (decoding, files) before the transaction, so other requests never wait on it.
    const stored: string[] = []
    try {
      const photos: NewPhoto[] = []
      for (const [index, upload] of uploads.entries()) {
        const label = `Photo ${index + 1} (${upload.originalName.slice(0, 80)})`
        const processed = await processPhoto(await readFile(upload.path), label)
        const displayKey = await this.storage.put(processed.display, 'jpg')
        stored.push(displayKey)
        const thumbKey = await this.storage.put(processed.thumb, 'jpg')
        stored.push(thumbKey)
        photos.push({ displayKey, thumbKey, width: processed.width, height: processed.height })
      }
      const body: Body = { pairs, vehicle: input.vehicle ?? null, measurements: input.measurements, notes: input.notes }
      const id = await this.repository.insert(
        { reporterId: user.id, reporterName: user.name, body: JSON.stringify(body), warnings: JSON.stringify(warnings) },
        photos,
      )
      return this.get(id, user)
    } catch (error) {
      await this.storage.remove(stored)
      throw error
    }
  }

  async list(
    query: { status?: FieldReportStatus; from?: string; to?: string; page: number; pageSize: number },
    user: User,
  ): Promise<FieldReportList> {
    const reporterId = can(user.role, 'field-reports.review') ? undefined : user.id
    const pair = await this.pairFilter(query.from, query.to)
    const { rows, total } = await this.repository.page(
      { status: query.status, reporterId, pair },
      (query.page - 1) * query.pageSize,
      query.pageSize,
    )
    const photos = await this.repository.photosOf(rows.map((row) => row.id))
    return {
      items: rows.map((row) =>
        toReport(
          row,
          photos.filter((photo) => photo.reportId === row.id),
        ),
      ),
      total,
    }
  }

  /** The newest reports no editor has decided yet, whoever filed them (for the editors' digest). */
  async waitingForReview(limit: number): Promise<FieldReport[]> {
    const { rows } = await this.repository.page({ status: 'submitted' }, 0, limit)
    const photos = await this.repository.photosOf(rows.map((row) => row.id))
    return rows.map((row) =>
      toReport(
        row,
        photos.filter((photo) => photo.reportId === row.id),
      ),
    )
  }

  async get(id: number, user: User): Promise<FieldReport> {
    const row = await this.visible(id, user)
    return toReport(row, await this.repository.photosOf([id]))
  }

  async photo(reportId: number, photoId: number, size: 'display' | 'thumb', user: User): Promise<Buffer> {
    await this.visible(reportId, user)
    const photo = await this.repository.photo(reportId, photoId)
    if (!photo) throw AppError.notFound(`Report ${reportId} has no photo ${photoId}.`)
    return this.storage.get(size === 'thumb' ? photo.thumbKey : photo.displayKey)
  }

  /** A tech sees their own reports only; someone else's answers 404, as if it did not exist. */
  private async visible(id: number, user: User): Promise<FieldReportRow> {
    const row = await this.repository.byId(id)
    if (!row || (!can(user.role, 'field-reports.review') && row.reporterId !== user.id)) {
      throw AppError.notFound(`No field report ${id}.`)
    }
    return row
  }

  private async resolvePairs(pairs: FieldReportInput['pairs']): Promise<FieldReportInput['pairs']> {
    const problems: FieldError[] = []
    const resolved: FieldReportInput['pairs'] = []
    for (const [index, pair] of pairs.entries()) {
      const from = await this.parts.findEntity(pair.from)
      const to = await this.parts.findEntity(pair.to)
      if (!from) problems.push({ path: `pairs.${index}.from`, message: `Unknown part number "${pair.from}".` })
      if (!to) problems.push({ path: `pairs.${index}.to`, message: `Unknown part number "${pair.to}".` })
      if (from && to && from.id === to.id) problems.push({ path: `pairs.${index}.to`, message: 'A pair needs two different parts.' })
      if (from && to) resolved.push({ ...pair, from: from.partNumber, to: to.partNumber })
    }
    if (problems.length) throw AppError.badRequest(problems[0]!.message, problems.slice(0, 20))
    return resolved
  }

  private async pairFilter(from: string | undefined, to: string | undefined): Promise<[number, number] | undefined> {
    if (from === undefined && to === undefined) return undefined
    if (!from || !to) {
      throw AppError.badRequest('Give both parts of the pair, from and to.', [
        { path: from ? 'to' : 'from', message: 'Give both parts of the pair.' },
      ])
    }
    return orderedPair([await this.parts.requireId(from, 'from'), await this.parts.requireId(to, 'to')])
  }

  private vinWarnings(vin: string | undefined): string[] {
    if (!vin) return []
    const check = validateVin(vin)
    return check.valid ? [] : [`The VIN ${vin} does not check: ${check.problems.join('; ')}.`]
  }
}
