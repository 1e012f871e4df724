import 'reflect-metadata'
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { PartService } from '../../server/catalogue/part.service'
import type { Database } from '../../server/db/database'
import { databaseOf } from '../../server/db/sqlite-connection'
import { FitGraphIndex } from '../../server/fitment/fit-graph'
import { LinkService } from '../../server/fitment/link.service'
import { databaseDrivers, type OpenedDatabase } from '../helpers/database-drivers'

const EDITOR = { id: 1, name: 'Tobias Ferrand' }
const insertPart = `INSERT INTO part ("partNumber", "partKey", "kind", "name", "family", "yearFrom", "yearTo", "notes", "attributes", "createdAt", "updatedAt")
  VALUES (?, ?, ?, ?, '', NULL, NULL, '', '{}', ?, ?) RETURNING "id"`

/** An editor's hand edits of links and identities, recorded as batches, on each driver (a chain of stores shares PostgreSQL). */
describe.each(databaseDrivers('link-edits'))('link hand edits on $name', { timeout: 30_000 }, (driver) => {
  let opened: OpenedDatabase
  let db: Database
  let links: LinkService
  let graph: FitGraphIndex
  beforeAll(async () => {
    opened = await driver.open()
    db = databaseOf(opened.dataSource)
    const now = new Date()
    const parts: [string, string][] = [
      ['LE-HD-1', 'head'],
      ['LE-BL-1', 'block'],
      ['LE-BL-2', 'block'],
    ]
    for (const [number, kind] of parts) await db.insert(insertPart, [number, number.replace(/-/g, ''), kind, number, now, now])
    graph = new FitGraphIndex(opened.dataSource)
    links = new LinkService(opened.dataSource, new PartService(opened.dataSource, () => graph.snapshot()), graph)
  })
  afterAll(async () => opened.close())

  it('creates, changes and removes a link, each as its own batch with the rows it replaced, and the graph follows', async () => {
    const link = await links.create(
      { fromPart: 'LE-HD-1', toPart: 'LE-BL-1', relation: 'fits-with-modification', modifications: ['le-new-dowels'], note: 'Shop find.' },
      EDITOR,
    )
    expect(link).toMatchObject({ relation: 'fits-with-modification', modifications: ['le-new-dowels'], status: 'approved' })
    // An unknown modification name becomes a proposed entry for an editor to describe.
    expect(await db.get('SELECT "status" FROM modification WHERE "name" = ?', ['le-new-dowels'])).toEqual({ status: 'proposed' })
    const snapshot = await graph.snapshot()
    const [head, block] = ['LE-HD-1', 'LE-BL-1'].map((number) => snapshot.byNumber.get(number)!)
    expect(snapshot.linkBetween(head!, block!)?.link.relation).toBe('fits-with-modification')

    await links.update(link.id, { relation: 'does-not-fit', modifications: [], note: 'Boss fouls the water jacket.' }, EDITOR)
    expect((await graph.snapshot()).linkBetween(head!, block!)?.link.relation).toBe('does-not-fit')
    const change = await db.get<{ previousValues: string }>(
      `SELECT "previousValues" FROM import_change WHERE "recordType" = 'link' AND "recordId" = ? AND "action" = 'updated'`,
      [link.id],
    )
    expect(JSON.parse(change!.previousValues).link[0]).toMatchObject({ relation: 'fits-with-modification', note: 'Shop find.' })

    await links.remove(link.id, EDITOR)
    expect((await graph.snapshot()).linkBetween(head!, block!)).toBeNull()
    const batches = await db.all<{ fileName: string }>('SELECT "fileName" FROM import_batch ORDER BY "id"')
    expect(batches.map((b) => b.fileName)).toEqual(['changed by hand', 'changed by hand', 'changed by hand'])
  })

  it('refuses an identity over a pair that is linked, writing nothing, and removes an identity it made', async () => {
    await links.create({ fromPart: 'LE-HD-1', toPart: 'LE-BL-2', relation: 'fits', modifications: [], note: '' }, EDITOR)
    const before = await db.get<{ n: number }>('SELECT CAST(COUNT(*) AS INTEGER) AS "n" FROM import_batch')
    await expect(links.createIdentity({ partA: 'LE-BL-2', partB: 'LE-HD-1', note: '' }, EDITOR)).rejects.toMatchObject({ status: 409 })
    expect(await db.get('SELECT CAST(COUNT(*) AS INTEGER) AS "n" FROM import_batch')).toEqual(before)
    const identity = await links.createIdentity({ partA: 'LE-BL-1', partB: 'LE-BL-2', note: 'Same casting.' }, EDITOR)
    expect(identity).toMatchObject({ partA: 'LE-BL-1', partB: 'LE-BL-2' })
    await links.removeIdentity(identity.id, EDITOR)
    await expect(links.removeIdentity(identity.id, EDITOR)).rejects.toMatchObject({ status: 404 })
  })
})
