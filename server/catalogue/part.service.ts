import type { DataSource } from 'typeorm'
import type { Part, PartList, PartListQuery } from '../../shared/schemas/part'
import { normalisePartCode } from '../../shared/schemas/part'
import type { ResolvedFrom } from '../../shared/schemas/part-lookup'
import { databaseOf } from '../db/sqlite-connection'
import { AppError } from '../errors/app-error'
import { PartRepository, toPart, type PartLabel, type PartRecord } from './part.repository'
import { PartSearchRepository } from './part-search.repository'
import { wordsOf } from './part-words'
import { pageOfHits, type PartDirectory } from './search-order'

export class PartService {
  private readonly repository: PartRepository
  private readonly search: PartSearchRepository

  /** `directory` holds every part's number and kind in memory, for ordering search hits (the fit graph). */
  constructor(
    dataSource: DataSource,
    private readonly directory: () => Promise<PartDirectory>,
  ) {
    const db = databaseOf(dataSource)
    this.repository = new PartRepository(db)
    this.search = new PartSearchRepository(db)
  }

  /**
   * Search by part number, casting or stamped mark, superseded number, or
   * words of the name or family. An exact number or mark ranks first, then a
   * number or mark the text starts, then parts whose words the text's words
   * start, because at the counter the customer usually holds the part.
   */
  async list(query: PartListQuery): Promise<PartList> {
    const text = query.q.trim()
    const page = { limit: query.pageSize, offset: (query.page - 1) * query.pageSize }
    const found = text
      ? pageOfHits(await this.search.tiers({ key: normalisePartCode(text), words: wordsOf(text) }), await this.directory(), {
          kind: query.kind,
          ...page,
        })
      : await this.search.browse(query.kind, page.limit, page.offset)
    return { items: await this.byIds(found.ids), total: found.total }
  }

  /** Parts by id, with their marks, in the order of the ids given. */
  async byIds(ids: number[]): Promise<Part[]> {
    return (await this.repository.byIds(ids)).map(toPart)
  }

  /** Name and family by part id, for labelling graph nodes. */
  async labels(ids: number[]): Promise<Map<number, PartLabel>> {
    return this.repository.labelsByIds(ids)
  }

  /** Parts by id with their row ids, in the order of the ids given. */
  async byIdsWithId(ids: number[]): Promise<PartRecord[]> {
    return this.repository.byIds(ids)
  }

  /** A part by its number, any of its marks or a superseded number, as typed at the counter. */
  async findEntity(code: string): Promise<PartRecord | null> {
    const exact = await this.repository.byNumber(code)
    if (exact) return exact
    const key = normalisePartCode(code)
    if (!key) return null
    // A mark can sit on several parts (a casting shared by identical numbers): the first catalogued wins.
    return (await this.repository.byKey(key)) ?? (await this.repository.byMarkKey(key)) ?? null
  }

  /**
   * The part with the mark it was found by, when the code was not its own
   * number: so a superseded number can say so instead of quietly opening the current part.
   */
  async resolve(code: string): Promise<{ entity: PartRecord; resolvedFrom: ResolvedFrom | null } | null> {
    const entity = await this.findEntity(code)
    if (!entity) return null
    const key = normalisePartCode(code)
    if (entity.partNumber === code || normalisePartCode(entity.partNumber) === key) return { entity, resolvedFrom: null }
    const mark = entity.marks.find((candidate) => normalisePartCode(candidate.value) === key)
    return { entity, resolvedFrom: mark ? { type: mark.type, value: mark.value } : null }
  }

  /** The part with the mark it was found by, or 404. */
  async requireResolved(code: string): Promise<{ entity: PartRecord; resolvedFrom: ResolvedFrom | null }> {
    const resolved = await this.resolve(code)
    if (!resolved) throw AppError.notFound(`No part with number or mark "${code}".`)
    return resolved
  }

  /** The part, or 404: for a part named in the address. */
  async requireEntity(code: string): Promise<PartRecord> {
    const entity = await this.findEntity(code)
    if (!entity) throw AppError.notFound(`No part with number or mark "${code}".`)
    return entity
  }

  /** The part's id, or 400 naming the field: for a part named in a request's input. */
  async requireId(code: string, path: string): Promise<number> {
    const entity = await this.findEntity(code)
    if (!entity) throw AppError.badRequest(`Unknown part number "${code}".`, [{ path, message: `Unknown part number "${code}".` }])
    return entity.id
  }

  async get(code: string): Promise<Part> {
    return toPart(await this.requireEntity(code))
  }
}
