import { afterEach, beforeEach, describe, expect, it } from 'vitest'
import { catalogueSnapshot, databaseSnapshot, uploadCsv } from '../helpers/imports'
import { createTestApp, type TestApp } from '../helpers/test-app'
import { databaseOf } from '../../server/db/sqlite-connection'
const fitResults = (body: { groups: { results: unknown[] }[] }) => body.groups.flatMap((group) => group.results)

let t: TestApp
let editor: Awaited<ReturnType<TestApp['signIn']>>
beforeEach(async () => {
  t = await createTestApp()
  editor = await t.signIn('editor')
})
afterEach(() => t.close())

const HEADER = 'from_part,to_part,relation,modifications,note,source'

async function linkRow(a: string, b: string) {
  const db = databaseOf(t.dataSource)
  const row = await db.get<{ id: number; relation: string; status: string; source: string; batchId: number | null; note: string }>(
    `SELECT l.* FROM link l JOIN part pa ON pa."id" = l."partAId" JOIN part pb ON pb."id" = l."partBId"
     WHERE (pa."partNumber" = ? AND pb."partNumber" = ?) OR (pa."partNumber" = ? AND pb."partNumber" = ?)`,
    [a, b, b, a],
  )
  if (!row) return undefined
  const mods = await db.column<string>(
    'SELECT m."name" FROM link_modification lm JOIN modification m ON m."id" = lm."modificationId" WHERE lm."linkId" = ? ORDER BY m."name"',
    [row.id],
  )
  return { ...row, mods: mods.length ? mods.join(';') : null }
}

describe('POST /api/imports, links, commit', () => {
  it('creates approved links with the batch as provenance, and proposes modifications it does not know', async () => {
    const csv = `${HEADER}\nTM-HD-2000R,TM-BL-2001,fits,,Exchange head on the late block.,\nTM-HD-1810,TM-BL-2000,fits-with-modification,oil-restrictor-remove-duplicate; head-stud-sleeve,Sleeve the bosses.,field-report\n`
    const response = await uploadCsv(editor, csv, { type: 'links', mode: 'commit' })
    expect(response.status).toBe(201)
    expect(response.body.counts).toEqual({ created: 2, updated: 0, unchanged: 0, rejected: 0 })
    expect(await linkRow('TM-HD-2000R', 'TM-BL-2001')).toMatchObject({
      relation: 'fits',
      status: 'approved',
      source: 'import',
      batchId: response.body.batchId,
    })
    expect(await linkRow('TM-BL-2000', 'TM-HD-1810')).toMatchObject({
      source: 'field-report',
      mods: expect.stringContaining('head-stud-sleeve'),
    })
    const [proposed] = await t.dataSource.query(`SELECT "status", "source", "batchId" FROM modification WHERE "name" = 'head-stud-sleeve'`)
    expect(proposed).toEqual({ status: 'proposed', source: 'import', batchId: response.body.batchId })
  })

  it('shows a committed link in what fits at once (the fit graph is rebuilt)', async () => {
    const before = await editor.get('/api/parts/TM-HD-2000R/fits?inferred=0')
    expect((fitResults(before.body) as { part: { partNumber: string } }[]).map((r) => r.part.partNumber)).not.toContain('TM-IM-1800')
    await uploadCsv(editor, `${HEADER}\nTM-HD-2000R,TM-IM-1800,does-not-fit,,Ports do not line up.,\n`, { type: 'links', mode: 'commit' })
    const after = await editor.get('/api/parts/TM-HD-2000R/fits?inferred=0')
    expect(fitResults(after.body)).toContainEqual(
      expect.objectContaining({ part: expect.objectContaining({ partNumber: 'TM-IM-1800' }), relation: 'does-not-fit' }),
    )
  })

  it('approves a proposed link the file names, and counts it as updated', async () => {
    expect(await linkRow('TM-EM-2000H', 'TM-HD-2050')).toMatchObject({ status: 'proposed' })
    const csv = `${HEADER}\nTM-HD-2050,TM-EM-2000H,fits,,Header clears the economy head's dipstick tube (field report from a member shop; awaiting review).,field-report\n`
    const response = await uploadCsv(editor, csv, { type: 'links', mode: 'commit' })
    expect(response.body.counts.updated).toBe(1)
    expect(response.body.changes[0].fields).toEqual([{ field: 'review', before: 'proposed', after: 'approved' }])
    expect(await linkRow('TM-EM-2000H', 'TM-HD-2050')).toMatchObject({ status: 'approved' })
  })

  it('declares two parts identical with the relation identical, replacing their approved fit link', async () => {
    const response = await uploadCsv(editor, `${HEADER}\nTM-BL-2000,TM-HD-2000,identical,,Test only.,editor\n`, {
      type: 'links',
      mode: 'commit',
    })
    expect(response.body.counts.updated).toBe(1)
    expect(await linkRow('TM-BL-2000', 'TM-HD-2000')).toBeUndefined()
    const identities = await t.dataSource.query(
      `SELECT i."source", i."batchId" FROM part_identity i JOIN part a ON a."id" = i."partAId" JOIN part b ON b."id" = i."partBId"
       WHERE a."partNumber" = 'TM-BL-2000' AND b."partNumber" = 'TM-HD-2000'`,
    )
    expect(identities).toEqual([{ source: 'editor', batchId: response.body.batchId }])
  })

  it('changes nothing when the same links file is imported a second time', async () => {
    const csv = `${HEADER}\nTM-HD-2000R,TM-BL-2001,fits,,Exchange head.,\nTM-CP-2000,TM-CP-2099,identical,,Same pulley.,\n`
    await t.dataSource.query(
      `INSERT INTO part ("partNumber", "partKey", "kind", "name", "attributes") VALUES ('TM-CP-2099', 'TMCP2099', 'crank-pulley', 'Pulley', '{}')`,
    )
    expect((await uploadCsv(editor, csv, { type: 'links', mode: 'commit' })).body.counts.created).toBe(2)
    const before = await catalogueSnapshot(t.dataSource)
    const again = await uploadCsv(editor, csv, { type: 'links', mode: 'commit' })
    expect(again.body.counts).toEqual({ created: 0, updated: 0, unchanged: 2, rejected: 0 })
    expect(await catalogueSnapshot(t.dataSource)).toEqual(before)
  })
})

describe('POST /api/imports, links, bad rows', () => {
  it.each([
    ['an unknown relation', 'TM-HD-2000R,TM-BL-2001,bolts-on,,,', 'relation', 'Unknown relation "bolts-on"'],
    ['a part in neither the catalogue nor the file', 'TM-HD-2000R,TM-BL-9999,fits,,,', 'to_part', 'No part TM-BL-9999'],
    ['a part linked to itself', 'TM-HD-2000R,TM-HD-2000R,fits,,,', 'to_part', 'cannot be linked to itself'],
    [
      'fits-with-modification without a modification',
      'TM-HD-2000R,TM-BL-2001,fits-with-modification,,,',
      'modifications',
      'needs at least one modification',
    ],
    ['a modification on a plain fit', 'TM-HD-2000R,TM-BL-2001,fits,oil-restrictor-fit,,', 'modifications', 'fits-with-modification only'],
    ['an unknown source', 'TM-HD-2000R,TM-BL-2001,fits,,,rumour', 'source', 'Unknown source "rumour"'],
    [
      'a modification name that is not a name',
      'TM-HD-2000R,TM-BL-2001,fits-with-modification,Drill it out,,',
      'modifications',
      'not a modification name',
    ],
  ])('rejects a row with %s at its column and writes nothing on commit', async (_what, line, column, message) => {
    const csv = `${HEADER}\nTM-HD-2000R,TM-IM-2000,fits,,Good row.,\n${line}\n`
    const preview = await uploadCsv(editor, csv, { type: 'links' })
    expect(preview.status).toBe(200)
    expect(preview.body.counts).toMatchObject({ created: 1, rejected: 1 })
    expect(preview.body.errors).toEqual([expect.objectContaining({ row: 3, column, message: expect.stringContaining(message) })])
    const before = await databaseSnapshot(t.dataSource)
    const commit = await uploadCsv(editor, csv, { type: 'links', mode: 'commit' })
    expect(commit.status).toBe(422)
    expect(await databaseSnapshot(t.dataSource)).toEqual(before)
  })

  it('suggests the catalogue spelling of a part number written differently', async () => {
    const preview = await uploadCsv(editor, `${HEADER}\ntm hd 2000r,TM-BL-2001,fits,,,\n`, { type: 'links' })
    expect(preview.body.errors[0]).toMatchObject({ column: 'from_part', message: expect.stringContaining('did you mean TM-HD-2000R?') })
  })

  it('rejects both rows of a pair given twice, in either order, with different relations', async () => {
    const csv = `${HEADER}\nTM-HD-2000R,TM-BL-2001,fits,,,\nTM-HD-2000R,TM-IM-2000,fits,,,\nTM-BL-2001,TM-HD-2000R,does-not-fit,,,\n`
    const before = await databaseSnapshot(t.dataSource)
    const preview = await uploadCsv(editor, csv, { type: 'links' })
    expect(preview.body.counts).toEqual({ created: 1, updated: 0, unchanged: 0, rejected: 2 })
    expect(preview.body.errors).toEqual([
      { row: 2, column: 'relation', message: expect.stringContaining('also on row 4 with a different relation') },
      { row: 4, column: 'relation', message: expect.stringContaining('also on row 2 with a different relation') },
    ])
    expect((await uploadCsv(editor, csv, { type: 'links', mode: 'commit' })).status).toBe(422)
    expect(await databaseSnapshot(t.dataSource)).toEqual(before)
  })

  it('refuses a links file with a column it does not know', async () => {
    const response = await uploadCsv(editor, `${HEADER},comment\nTM-HD-2000R,TM-BL-2001,fits,,,,hello\n`, { type: 'links' })
    expect(response.status).toBe(400)
    expect(response.body.error.message).toContain('Unknown column "comment"')
  })

  it('refuses a links file without the relation column', async () => {
    const response = await uploadCsv(editor, 'from_part,to_part\nTM-HD-2000R,TM-BL-2001\n', { type: 'links', mode: 'commit' })
    expect(response.status).toBe(400)
    expect(response.body.error.details).toEqual([{ path: 'row 1, relation', message: 'Required column "relation" is missing.' }])
  })
})

describe('POST /api/imports, links, a parts file', () => {
  it('says the file looks like a parts file and writes nothing', async () => {
    const before = await databaseSnapshot(t.dataSource)
    const response = await uploadCsv(editor, 'part_number,kind,name\nTM-X-1,block,Odd block\n', { type: 'links', mode: 'commit' })
    expect(response.status).toBe(400)
    expect(response.body.error.code).toBe('wrong_file')
    expect(response.body.error.message).toContain('Row 1 looks like the header of a parts file')
    expect(await databaseSnapshot(t.dataSource)).toEqual(before)
  })
})
