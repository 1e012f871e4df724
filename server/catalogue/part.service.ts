import type { DataSource } from 'typeorm'
import type { Part, PartList, PartListQuery } from '../../shared/schemas/part'
import { normalisePartCode } from '../../shared/schemas/part'
import { databaseOf } from '../db/sqlite-connection'
import { AppError } from '../errors/app-error'
import { PartRepository, toPart, type PartRecord } from './part.repository'

function escapeLike(value: string): string {
  return value.replace(/[\\%_]/g, (c) => `\\${c}`)
}

export class PartService {
  private readonly repository: PartRepository

  constructor(private readonly dataSource: DataSource) {
    this.repository = new PartRepository(databaseOf(dataSource))
  }

  /**
   * Search by part number, casting or stamped mark, superseded number, name or
   * family. Exact and prefix matches on a number or mark rank first, because at
   * the counter the customer usually holds the part.
   */
  async list(query: PartListQuery): Promise<PartList> {
    const where: string[] = []
    const params: unknown[] = []
    if (query.kind) {
      where.push('p.kind = ?')
      params.push(query.kind)
    }
    const text = query.q.trim()
    const key = normalisePartCode(text)
    let rank = '0'
    const rankParams: unknown[] = []
    if (text) {
      const like = `%${escapeLike(text)}%`
      const keyLike = `%${escapeLike(key)}%`
      const matches = [`p.name LIKE ? ESCAPE '\\'`, `p.family LIKE ? ESCAPE '\\'`]
      params.push(like, like)
      if (key) {
        matches.push(`p.partKey LIKE ? ESCAPE '\\'`, `p.id IN (SELECT partId FROM part_mark WHERE valueKey LIKE ? ESCAPE '\\')`)
        params.push(keyLike, keyLike)
        rank = `CASE WHEN p.partKey = ? OR p.id IN (SELECT partId FROM part_mark WHERE valueKey = ?) THEN 0
                     WHEN p.partKey LIKE ? ESCAPE '\\' THEN 1 ELSE 2 END`
        rankParams.push(key, key, `${escapeLike(key)}%`)
      }
      where.push(`(${matches.join(' OR ')})`)
    }
    const whereSql = where.length ? `WHERE ${where.join(' AND ')}` : ''
    const [{ total }] = (await this.dataSource.query(`SELECT COUNT(*) AS total FROM part p ${whereSql}`, params)) as [
      { total: number },
    ]
    const rows = (await this.dataSource.query(
      `SELECT p.id AS id, ${rank} AS rank FROM part p ${whereSql} ORDER BY rank, p.partNumber LIMIT ? OFFSET ?`,
      [...rankParams, ...params, query.pageSize, (query.page - 1) * query.pageSize],
    )) as { id: number }[]
    return { items: await this.byIds(rows.map((row) => row.id)), total }
  }

  /** Parts by id, with their marks, in the order of the ids given. */
  async byIds(ids: number[]): Promise<Part[]> {
    return (await this.repository.byIds(ids)).map(toPart)
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
