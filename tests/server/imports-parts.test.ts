import { afterEach, beforeEach, describe, expect, it } from 'vitest'
import { catalogueSnapshot, databaseSnapshot, uploadCsv } from '../helpers/imports'
import { createTestApp, type TestApp } from '../helpers/test-app'

let t: TestApp
let editor: Awaited<ReturnType<TestApp['signIn']>>
beforeEach(async () => {
  t = await createTestApp()
  editor = await t.signIn('editor')
})
afterEach(() => t.close())

const NEW_HEAD = [
  'part_number,kind,name,family,year_from,year_to,notes,casting_marks,chamber_cc,oil_restrictor,valve_lift,finish',
  'TM-HD-2100,head,"TK20V cylinder head, ported",TK20V,1996,2000,"Ported and flowed; ""stage 1""",H20-3190; H20-3191,42.5,no,variable,shot-peened',
].join('\n')

describe('POST /api/imports, parts, preview', () => {
  it('answers counts and what each row would change, and writes nothing', async () => {
    const before = await databaseSnapshot(t.dataSource)
    const csv = `${NEW_HEAD}\nTM-HD-2000,head,TK20V cylinder head,TK20V,1992,2001,,H20-3180,44,no,variable,\n`
    const response = await uploadCsv(editor, csv, { type: 'parts', mode: 'preview' })
    expect(response.status).toBe(200)
    expect(response.body.batchId).toBeUndefined()
    expect(response.body.counts).toEqual({ created: 1, updated: 1, unchanged: 0, rejected: 0 })
    const update = response.body.changes.find((change: { key: string }) => change.key === 'TM-HD-2000')
    expect(update.action).toBe('update')
    expect(update.fields).toContainEqual({ field: 'year_to', before: '2000', after: '2001' })
    expect(response.body.changes.find((change: { key: string }) => change.key === 'TM-HD-2100').action).toBe('create')
    expect(await databaseSnapshot(t.dataSource)).toEqual(before)
  })
})

describe('POST /api/imports, parts, commit', () => {
  it('creates the part with typed attributes, unknown columns as text and marks from the list columns', async () => {
    const response = await uploadCsv(editor, NEW_HEAD, { type: 'parts', mode: 'commit' })
    expect(response.status).toBe(201)
    expect(response.body.batchId).toEqual(expect.any(Number))
    const part = await editor.get('/api/parts/TM-HD-2100')
    expect(part.body).toMatchObject({
      name: 'TK20V cylinder head, ported',
      notes: 'Ported and flowed; "stage 1"',
      yearFrom: 1996,
      attributes: { chamberCc: 42.5, oilRestrictor: false, valveLift: 'variable', finish: 'shot-peened' },
    })
    expect(part.body.marks).toEqual([
      { type: 'casting', value: 'H20-3190' },
      { type: 'casting', value: 'H20-3191' },
    ])
    const [row] = await t.dataSource.query(`SELECT "batchId" FROM part WHERE "partNumber" = 'TM-HD-2100'`)
    expect(row.batchId).toBe(response.body.batchId)
  })

  it('changes nothing when the same file is imported a second time', async () => {
    await uploadCsv(editor, NEW_HEAD, { type: 'parts', mode: 'commit' })
    const before = await catalogueSnapshot(t.dataSource)
    const again = await uploadCsv(editor, NEW_HEAD, { type: 'parts', mode: 'commit' })
    expect(again.status).toBe(201)
    expect(again.body.counts).toEqual({ created: 0, updated: 0, unchanged: 1, rejected: 0 })
    expect(await catalogueSnapshot(t.dataSource)).toEqual(before)
  })

  it('keeps values of columns the file does not have and clears those given as empty cells', async () => {
    const csv = 'part_number,kind,name,notes,chamber_cc\nTM-HD-2000,head,TK20V cylinder head,,45\n'
    const response = await uploadCsv(editor, csv, { type: 'parts', mode: 'commit' })
    expect(response.body.counts.updated).toBe(1)
    const part = (await editor.get('/api/parts/TM-HD-2000')).body
    expect(part.notes).toBe('')
    expect(part.attributes.chamberCc).toBe(45)
    expect(part.attributes.camNose).toBe('CN-2')
    expect(part.family).toBe('TK20V')
    expect(part.marks).toContainEqual({ type: 'casting', value: 'H20-3180' })
  })
})

describe('POST /api/imports, parts, bad rows', () => {
  const header = 'part_number,kind,name,family,year_from,year_to,bore_mm'
  it.each([
    ['an unknown kind', 'TM-X-1,flux-capacitor,Odd part,,,,', 'kind', 'Unknown kind "flux-capacitor"'],
    ['a non-numeric value in a numeric attribute', 'TM-X-1,block,Odd block,,,,eighty-six', 'bore_mm', 'not a number'],
    ['year_from after year_to', 'TM-X-1,block,Odd block,,1999,1990,86', 'year_from', 'after year_to'],
    ['a missing name', 'TM-X-1,block,,,,,86', 'name', 'Name is required'],
  ])('rejects a row with %s at its column and writes nothing on commit', async (_what, line, column, message) => {
    const csv = `${header}\nTM-X-0,block,Good block,TK20V,1990,1995,86\n${line}\n`
    const preview = await uploadCsv(editor, csv, { type: 'parts' })
    expect(preview.body.counts).toMatchObject({ created: 1, rejected: 1 })
    expect(preview.body.errors).toEqual([expect.objectContaining({ row: 3, column })])
    expect(preview.body.errors[0].message).toContain(message)
    const before = await databaseSnapshot(t.dataSource)
    const commit = await uploadCsv(editor, csv, { type: 'parts', mode: 'commit' })
    expect(commit.status).toBe(422)
    expect(commit.body.error.code).toBe('rows_rejected')
    expect(commit.body.error.details[0]).toEqual({ path: `row 3, ${column}`, message: expect.stringContaining(message) })
    expect(await databaseSnapshot(t.dataSource)).toEqual(before)
  })

  it('rejects every row of a part number given twice with conflicting values, naming the other row', async () => {
    const csv = `${header}\nTM-X-1,block,Block A,TK20V,,,86\nTM-X-2,block,Block B,TK20V,,,84\nTM-X-1,block,Block A,TK20V,,,87\n`
    const before = await databaseSnapshot(t.dataSource)
    const preview = await uploadCsv(editor, csv, { type: 'parts' })
    expect(preview.body.counts).toEqual({ created: 1, updated: 0, unchanged: 0, rejected: 2 })
    expect(preview.body.errors).toEqual([
      { row: 2, column: 'part_number', message: expect.stringContaining('also on row 4 with different values (bore_mm)') },
      { row: 4, column: 'part_number', message: expect.stringContaining('also on row 2') },
    ])
    expect((await uploadCsv(editor, csv, { type: 'parts', mode: 'commit' })).status).toBe(422)
    expect(await databaseSnapshot(t.dataSource)).toEqual(before)
  })

  it('counts a part number repeated with the same values once and the repeat as unchanged', async () => {
    const csv = `${header}\nTM-X-1,block,Block A,TK20V,,,86\nTM-X-1,block,Block A,TK20V,,,86\n`
    const preview = await uploadCsv(editor, csv, { type: 'parts' })
    expect(preview.body.counts).toEqual({ created: 1, updated: 0, unchanged: 1, rejected: 0 })
  })

  it('rejects a new number that only differs from a catalogue number in case or punctuation', async () => {
    const preview = await uploadCsv(editor, `${header}\ntm hd 2000,head,Lower-case head,,,,\n`, { type: 'parts' })
    expect(preview.body.errors[0]).toMatchObject({ row: 2, column: 'part_number', message: expect.stringContaining('TM-HD-2000') })
  })

  it('commits only the valid rows when the editor asks, recording the rejected ones', async () => {
    const csv = `${header}\nTM-X-1,block,Good block,,,,86\nTM-X-2,block,Bad block,,,,wide\n`
    const response = await uploadCsv(editor, csv, { type: 'parts', mode: 'commit', validRowsOnly: true })
    expect(response.status).toBe(201)
    expect(response.body.counts).toEqual({ created: 1, updated: 0, unchanged: 0, rejected: 1 })
    expect(response.body.errors).toEqual([expect.objectContaining({ row: 3, column: 'bore_mm' })])
    expect((await editor.get('/api/parts/TM-X-1')).status).toBe(200)
    expect((await editor.get('/api/parts/TM-X-2')).status).toBe(404)
    const [batch] = (await editor.get('/api/imports')).body
    expect(batch).toMatchObject({ id: response.body.batchId, validRowsOnly: true, counts: { rejected: 1 } })
  })
})

describe('POST /api/imports, parts, bad header', () => {
  it.each([
    ['a missing header row', 'TM-X-1,block,Odd block\n', 'missing_header', 'not a header row'],
    ['a missing required column', 'part_number,name\nTM-X-1,Odd block\n', 'invalid_header', 'Required column "kind" is missing'],
    ['a column named twice', 'part_number,kind,name,name\nTM-X-1,block,A,B\n', 'invalid_header', 'Column "name" appears twice'],
    [
      'the header of a links file',
      'from_part,to_part,relation\nTM-HD-1810,TM-BL-2000,fits\n',
      'wrong_file',
      'looks like the header of a links file',
    ],
  ])('refuses a file with %s at row 1 and writes nothing', async (_what, csv, code, message) => {
    const before = await databaseSnapshot(t.dataSource)
    for (const mode of ['preview', 'commit'] as const) {
      const response = await uploadCsv(editor, csv, { type: 'parts', mode })
      expect(response.status).toBe(400)
      expect(response.body.error.code).toBe(code)
      expect(response.body.error.message).toContain('Row 1')
      expect(response.body.error.message).toContain(message)
    }
    expect(await databaseSnapshot(t.dataSource)).toEqual(before)
  })
})

describe('POST /api/imports, parts, every problem of a row', () => {
  it('rejects a row with an empty name and a bad year, naming both', async () => {
    const csv = 'part_number,kind,name,year_from\nTM-X-9,block,,19x9\n'
    const response = await uploadCsv(editor, csv, { type: 'parts', mode: 'preview' })
    expect(response.status).toBe(200)
    const columns = response.body.errors.filter((e: { row: number }) => e.row === 2).map((e: { column: string }) => e.column)
    expect(columns.sort()).toEqual(['name', 'year_from'])
  })
})
