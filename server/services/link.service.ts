import type { DataSource } from 'typeorm'
import type { Identity, IdentityCreate, Link, LinkCreate, LinkList, LinkUpdate } from '../../shared/schemas/link'
import type { ReviewStatus } from '../../shared/schemas/fitment'
import { inTransaction } from '../db/sqlite-connection'
import { AppError } from '../errors/app-error'
import type { FitGraphIndex } from './fit-graph'
import { handEdit, type Editor } from './hand-edit'
import { orderedPair } from './link-writer'
import type { PartService } from './part.service'

type LinkRow = Omit<Link, 'modifications' | 'createdAt' | 'updatedAt'> & { createdAt: string; updatedAt: string; modifications: string | null }

const LINK_SELECT = `SELECT l.id, a.partNumber AS "from", b.partNumber AS "to", l.relation, l.note, l.source, l.status, l.createdAt, l.updatedAt,
  (SELECT group_concat(m.name, ';') FROM link_modification lm JOIN modification m ON m.id = lm.modificationId WHERE lm.linkId = l.id) AS modifications
  FROM link l JOIN part a ON a.id = l.partAId JOIN part b ON b.id = l.partBId`

function toLink(row: LinkRow): Link {
  return {
    ...row,
    modifications: row.modifications ? row.modifications.split(';').sort() : [],
    createdAt: new Date(`${row.createdAt}Z`).toISOString(),
    updatedAt: new Date(`${row.updatedAt}Z`).toISOString(),
  }
}

/** An editor's own changes to the fitment graph: links, their review, identities. */
export class LinkService {
  constructor(
    private readonly dataSource: DataSource,
    private readonly parts: PartService,
    private readonly graphIndex: FitGraphIndex,
  ) {}

  async list(query: { status?: ReviewStatus; part?: string; page: number; pageSize: number }): Promise<LinkList> {
    const where: string[] = []
    const params: unknown[] = []
    if (query.status) {
      where.push('l.status = ?')
      params.push(query.status)
    }
    if (query.part) {
      const part = await this.partId(query.part, 'part')
      where.push('(l.partAId = ? OR l.partBId = ?)')
      params.push(part, part)
    }
    const whereSql = where.length ? ` WHERE ${where.join(' AND ')}` : ''
    const [{ total }] = (await this.dataSource.query(`SELECT COUNT(*) AS total FROM link l${whereSql}`, params)) as [{ total: number }]
    const rows = (await this.dataSource.query(`${LINK_SELECT}${whereSql} ORDER BY l.updatedAt DESC, l.id DESC LIMIT ? OFFSET ?`, [
      ...params,
      query.pageSize,
      (query.page - 1) * query.pageSize,
    ])) as LinkRow[]
    return { items: rows.map(toLink), total }
  }

  async get(id: number): Promise<Link> {
    const [row] = (await this.dataSource.query(`${LINK_SELECT} WHERE l.id = ?`, [id])) as LinkRow[]
    if (!row) throw AppError.notFound(`No link ${id}.`)
    return toLink(row)
  }

  private async partId(code: string, path: string): Promise<number> {
    const entity = await this.parts.findEntity(code)
    if (!entity) throw AppError.badRequest(`Unknown part number "${code}".`, [{ path, message: `Unknown part number "${code}".` }])
    return entity.id
  }

  private async pair(a: string, b: string, paths: [string, string]): Promise<[number, number]> {
    const ids: [number, number] = [await this.partId(a, paths[0]), await this.partId(b, paths[1])]
    if (ids[0] === ids[1]) {
      throw AppError.badRequest('A part cannot be linked to itself.', [{ path: paths[1], message: 'Choose another part than the first.' }])
    }
    return orderedPair(ids)
  }

  /** A link an editor writes is reviewed by that act: approved, from the editor. */
  async create(input: LinkCreate, editor: Editor): Promise<Link> {
    const [a, b] = await this.pair(input.fromPart, input.toPart, ['fromPart', 'toPart'])
    const id = await inTransaction(this.dataSource, (db) => {
      if (db.prepare('SELECT 1 FROM link WHERE partAId = ? AND partBId = ?').get(a, b)) {
        throw AppError.conflict('These two parts are linked already; change that link instead.', [
          { path: 'toPart', message: 'Already linked to the first part.' },
        ])
      }
      const edit = handEdit(db, editor, { created: 1, updated: 0 })
      const linkId = Number(
        db
          .prepare("INSERT INTO link (partAId, partBId, relation, note, source, status, batchId) VALUES (?, ?, ?, ?, 'editor', 'approved', ?)")
          .run(a, b, input.relation, input.note, edit.batchId).lastInsertRowid,
      )
      edit.setLinkModifications(linkId, edit.modificationIds(input.modifications))
      return linkId
    })
    this.graphIndex.invalidate()
    return this.get(id)
  }

  /** Changes a link, or reviews it (approve or reject a proposed link). */
  async update(id: number, change: LinkUpdate, editor: Editor): Promise<Link> {
    const current = await this.get(id)
    const relation = change.relation ?? current.relation
    const modifications = change.modifications ?? (relation === 'fits-with-modification' ? current.modifications : [])
    if (relation === 'fits-with-modification' && modifications.length === 0) {
      throw AppError.badRequest('Name the modification a fit with modification needs.', [{ path: 'modifications', message: 'Required for a fit with modification.' }])
    }
    await inTransaction(this.dataSource, (db) => {
      const edit = handEdit(db, editor, { created: 0, updated: 1 })
      edit.rememberLink(id, 'updated')
      db.prepare(`UPDATE link SET relation = ?, note = ?, status = ?, batchId = ?, updatedAt = ${edit.now} WHERE id = ?`).run(
        relation,
        change.note ?? current.note,
        change.status ?? current.status,
        edit.batchId,
        id,
      )
      edit.setLinkModifications(id, edit.modificationIds(modifications))
    })
    this.graphIndex.invalidate()
    return this.get(id)
  }

  async remove(id: number, editor: Editor): Promise<void> {
    await this.get(id)
    await inTransaction(this.dataSource, (db) => {
      const edit = handEdit(db, editor, { created: 0, updated: 1 })
      edit.rememberLink(id, 'deleted')
      db.prepare('DELETE FROM link WHERE id = ?').run(id)
    })
    this.graphIndex.invalidate()
  }

  async createIdentity(input: IdentityCreate, editor: Editor): Promise<Identity> {
    const [a, b] = await this.pair(input.partA, input.partB, ['partA', 'partB'])
    const id = await inTransaction(this.dataSource, (db) => {
      if (db.prepare('SELECT 1 FROM part_identity WHERE partAId = ? AND partBId = ?').get(a, b)) {
        throw AppError.conflict('These two parts are declared identical already.')
      }
      const edit = handEdit(db, editor, { created: 1, updated: 0 })
      return Number(
        db
          .prepare("INSERT INTO part_identity (partAId, partBId, note, source, batchId) VALUES (?, ?, ?, 'editor', ?)")
          .run(a, b, input.note, edit.batchId).lastInsertRowid,
      )
    })
    this.graphIndex.invalidate()
    const graph = await this.graphIndex.snapshot()
    return { id, partA: graph.part(a).partNumber, partB: graph.part(b).partNumber, note: input.note, source: 'editor' }
  }

  async removeIdentity(id: number, editor: Editor): Promise<void> {
    const removed = await inTransaction(this.dataSource, (db) => {
      if (!db.prepare('SELECT 1 FROM part_identity WHERE id = ?').get(id)) return false
      const edit = handEdit(db, editor, { created: 0, updated: 1 })
      edit.rememberIdentity(id)
      db.prepare('DELETE FROM part_identity WHERE id = ?').run(id)
      return true
    })
    if (!removed) throw AppError.notFound(`No identity ${id}.`)
    this.graphIndex.invalidate()
  }
}
