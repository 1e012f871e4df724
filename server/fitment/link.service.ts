import type { DataSource } from 'typeorm'
import type { Identity, IdentityCreate, Link, LinkCreate, LinkList, LinkUpdate } from '../../shared/schemas/link'
import type { ReviewStatus } from '../../shared/schemas/fitment'
import type { Database } from '../db/database'
import { databaseOf } from '../db/sqlite-connection'
import { LinkListRepository } from './link-list.repository'
import { AppError } from '../errors/app-error'
import type { FitGraphIndex } from './fit-graph'
import { handEdit, type Editor } from '../audit/hand-edit'
import { insertIdentityRow, insertLinkRow, orderedPair, pairHolder } from './link-rows'
import type { PartService } from '../catalogue/part.service'

/** An editor's own changes to the fitment graph: links, their review, identities. */
export class LinkService {
  private readonly rows: LinkListRepository
  private readonly db: Database

  constructor(
    dataSource: DataSource,
    private readonly parts: PartService,
    private readonly graphIndex: FitGraphIndex,
  ) {
    this.db = databaseOf(dataSource)
    this.rows = new LinkListRepository(this.db)
  }

  async list(query: { status?: ReviewStatus; part?: string; contradicted?: boolean; page: number; pageSize: number }): Promise<LinkList> {
    const partId = query.part ? await this.parts.requireId(query.part, 'part') : undefined
    return this.rows.page(
      { status: query.status, partId, contradicted: query.contradicted },
      (query.page - 1) * query.pageSize,
      query.pageSize,
    )
  }

  async get(id: number): Promise<Link> {
    const link = await this.rows.byId(id)
    if (!link) throw AppError.notFound(`No link ${id}.`)
    return link
  }

  private async pair(a: string, b: string, paths: [string, string]): Promise<[number, number]> {
    const ids: [number, number] = [await this.parts.requireId(a, paths[0]), await this.parts.requireId(b, paths[1])]
    if (ids[0] === ids[1]) {
      throw AppError.badRequest('A part cannot be linked to itself.', [{ path: paths[1], message: 'Choose another part than the first.' }])
    }
    return orderedPair(ids)
  }

  /** A link an editor writes is reviewed by that act: approved, from the editor. */
  async create(input: LinkCreate, editor: Editor): Promise<Link> {
    const partIds = await this.pair(input.fromPart, input.toPart, ['fromPart', 'toPart'])
    const id = await this.db.transaction(async (db) => {
      await refuseTakenPair(db, partIds, 'toPart')
      const edit = await handEdit(db, editor, { created: 1, updated: 0 })
      const { relation, modifications, note } = input
      return insertLinkRow(db, { partIds, relation, modifications, note, source: 'editor', status: 'approved', batchId: edit.batchId })
    })
    await this.graphIndex.applyChanges({ links: [id] })
    return this.get(id)
  }

  /** Changes a link, or reviews it (approve or reject a proposed link). */
  async update(id: number, change: LinkUpdate, editor: Editor): Promise<Link> {
    const current = await this.get(id)
    const relation = change.relation ?? current.relation
    const modifications = change.modifications ?? (relation === 'fits-with-modification' ? current.modifications : [])
    checkModifications(relation, modifications)
    await this.db.transaction(async (db) => {
      const edit = await handEdit(db, editor, { created: 0, updated: 1 })
      await edit.rememberLink(id, 'updated')
      await db.run('UPDATE link SET "relation" = ?, "note" = ?, "status" = ?, "batchId" = ?, "updatedAt" = ? WHERE "id" = ?', [
        relation,
        change.note ?? current.note,
        change.status ?? current.status,
        edit.batchId,
        new Date(),
        id,
      ])
      await edit.setModifications(id, modifications)
    })
    await this.graphIndex.applyChanges({ links: [id] })
    return this.get(id)
  }

  async remove(id: number, editor: Editor): Promise<void> {
    await this.get(id)
    await this.db.transaction(async (db) => {
      const edit = await handEdit(db, editor, { created: 0, updated: 1 })
      await edit.rememberLink(id, 'deleted')
      await db.run('DELETE FROM link WHERE "id" = ?', [id])
    })
    await this.graphIndex.applyChanges({ links: [id] })
  }

  async createIdentity(input: IdentityCreate, editor: Editor): Promise<Identity> {
    const partIds = await this.pair(input.partA, input.partB, ['partA', 'partB'])
    const id = await this.db.transaction(async (db) => {
      await refuseTakenPair(db, partIds, 'partB')
      const edit = await handEdit(db, editor, { created: 1, updated: 0 })
      return insertIdentityRow(db, { partIds, note: input.note, source: 'editor', batchId: edit.batchId })
    })
    await this.graphIndex.applyChanges({ identities: [id] })
    const [partA, partB] = await this.parts.byIds(orderedPair(partIds))
    return { id, partA: partA!.partNumber, partB: partB!.partNumber, note: input.note, source: 'editor' }
  }

  async removeIdentity(id: number, editor: Editor): Promise<void> {
    const removed = await this.db.transaction(async (db) => {
      if (!(await db.get('SELECT 1 AS "found" FROM part_identity WHERE "id" = ?', [id]))) return false
      const edit = await handEdit(db, editor, { created: 0, updated: 1 })
      await edit.rememberIdentity(id)
      await db.run('DELETE FROM part_identity WHERE "id" = ?', [id])
      return true
    })
    if (!removed) throw AppError.notFound(`No identity ${id}.`)
    await this.graphIndex.applyChanges({ identities: [id] })
  }
}

/** Only a fit with modification names modifications, and it names at least one. */
function checkModifications(relation: string, modifications: string[]) {
  if (relation === 'fits-with-modification' && modifications.length === 0) {
    throw AppError.badRequest('Name the modification a fit with modification needs.', [
      { path: 'modifications', message: 'Required for a fit with modification.' },
    ])
  }
  if (relation !== 'fits-with-modification' && modifications.length > 0) {
    throw AppError.badRequest('Only a fit with modification names modifications.', [
      { path: 'modifications', message: 'Leave empty for this relation.' },
    ])
  }
}

/** A pair holds one relation: a fit link or an identity, as imports have it too. */
async function refuseTakenPair(db: Database, partIds: [number, number], path: string) {
  const holder = await pairHolder(db, partIds)
  if (holder === 'link')
    throw AppError.conflict('These two parts are linked already; change that link instead.', [
      { path, message: 'Already linked to the first part.' },
    ])
  if (holder === 'identity')
    throw AppError.conflict('These two parts are declared identical already.', [{ path, message: 'Already the same part as the first.' }])
}
