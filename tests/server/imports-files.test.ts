import { afterEach, describe, expect, it } from 'vitest'
import { importStreamLineSchema } from '../../shared/schemas/imports'
import { databaseSnapshot, uploadCsv } from '../helpers/imports'
import { createTestApp, type TestApp } from '../helpers/test-app'

let t: TestApp
afterEach(() => t.close())

async function editorOn(env: Record<string, string> = {}) {
  t = await createTestApp({ env })
  return t.signIn('editor')
}

describe('POST /api/imports, file formats', () => {
  it('reads semicolons, a byte-order mark, CRLF and RFC 4180 quoting (delimiters, quotes and line breaks in cells)', async () => {
    const editor = await editorOn()
    const csv = '\uFEFFpart_number;kind;name;notes\r\nTM-X-1;other;"Washer; hardened";"Line one\r\nsays ""hi""; and, well"\r\n'
    const response = await uploadCsv(editor, csv, { type: 'parts', mode: 'commit' })
    expect(response.status).toBe(201)
    const part = (await editor.get('/api/parts/TM-X-1')).body
    expect(part.name).toBe('Washer; hardened')
    expect(part.notes).toBe('Line one\r\nsays "hi"; and, well')
  })

  it('reads tab-separated files', async () => {
    const editor = await editorOn()
    const response = await uploadCsv(editor, 'part_number\tkind\tname\nTM-X-1\tother\tSpacer, thin\n', { type: 'parts', mode: 'commit' })
    expect(response.status).toBe(201)
    expect((await editor.get('/api/parts/TM-X-1')).body.name).toBe('Spacer, thin')
  })

  it('numbers rows as a spreadsheet does, a quoted line break staying in its row', async () => {
    const editor = await editorOn()
    const csv = 'part_number,kind,name,notes\nTM-X-1,other,A,"two\nlines"\n\nTM-X-2,flux,B,\n'
    const response = await uploadCsv(editor, csv, { type: 'parts' })
    expect(response.body.errors).toEqual([expect.objectContaining({ row: 4, column: 'kind' })])
  })

  it('rejects a row with more cells than the header names', async () => {
    const editor = await editorOn()
    const response = await uploadCsv(editor, 'part_number,kind,name\nTM-X-1,other,Washer, hardened\n', { type: 'parts' })
    expect(response.body.errors[0]).toMatchObject({ row: 2, message: expect.stringContaining('4 cells but the header names 3') })
  })
})

describe('POST /api/imports, files refused whole', () => {
  const png = Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a, 0x00, 0x00, 0x00, 0x0d, 0x49, 0x48, 0x44, 0x52])
  const latin1 = Buffer.from('part_number,kind,name\nTM-X-1,other,Rondelle \xe9paisse\n', 'latin1')
  it.each([
    ['an empty file', Buffer.alloc(0), 400, 'empty_file', 'The file is empty'],
    ['a file of blank lines', Buffer.from('\r\n \n\n'), 400, 'empty_file', 'The file is empty'],
    ['a header without rows', Buffer.from('part_number,kind,name\n'), 400, 'empty_file', 'no rows below it'],
    ['a binary file', png, 400, 'not_text', 'not a CSV text file'],
    ['text that is not UTF-8', latin1, 400, 'not_text', 'not UTF-8'],
    ['an unterminated quoted cell', Buffer.from('part_number,kind,name\nTM-X-1,other,"Washer\n'), 400, 'malformed_csv', 'Near row 2'],
  ])('refuses %s with a message and writes nothing', async (_what, bytes, status, code, message) => {
    const editor = await editorOn()
    const before = await databaseSnapshot(t.dataSource)
    const response = await uploadCsv(editor, bytes, { type: 'parts', mode: 'commit' })
    expect(response.status).toBe(status)
    expect(response.body.error).toMatchObject({ code, message: expect.stringContaining(message) })
    expect(await databaseSnapshot(t.dataSource)).toEqual(before)
  })

  it('refuses a file over the configured size limit with 413', async () => {
    const editor = await editorOn({ FITWRIGHT_IMPORT_MAX_BYTES: '200' })
    const before = await databaseSnapshot(t.dataSource)
    const rows = Array.from({ length: 20 }, (_, i) => `TM-X-${i},other,Washer ${i}`)
    const response = await uploadCsv(editor, ['part_number,kind,name', ...rows].join('\n'), { type: 'parts', mode: 'commit' })
    expect(response.status).toBe(413)
    expect(response.body.error).toMatchObject({ code: 'file_too_large', message: expect.stringContaining('200 bytes') })
    expect(await databaseSnapshot(t.dataSource)).toEqual(before)
  })

  it('refuses a file with more rows than the configured limit with 413', async () => {
    const editor = await editorOn({ FITWRIGHT_IMPORT_MAX_ROWS: '3' })
    const before = await databaseSnapshot(t.dataSource)
    const rows = Array.from({ length: 4 }, (_, i) => `TM-X-${i},other,Washer ${i}`)
    const response = await uploadCsv(editor, ['part_number,kind,name', ...rows].join('\n'), { type: 'parts', mode: 'commit' })
    expect(response.status).toBe(413)
    expect(response.body.error).toMatchObject({ code: 'too_many_rows', message: expect.stringContaining('more than 3 rows') })
    expect(await databaseSnapshot(t.dataSource)).toEqual(before)
  })

  it('accepts a file of exactly the row limit', async () => {
    const editor = await editorOn({ FITWRIGHT_IMPORT_MAX_ROWS: '3' })
    const rows = Array.from({ length: 3 }, (_, i) => `TM-X-${i},other,Washer ${i}`)
    const response = await uploadCsv(editor, ['part_number,kind,name', ...rows].join('\n'), { type: 'parts', mode: 'commit' })
    expect(response.status).toBe(201)
  })

  it('answers 400 naming the field for a missing file or an unknown type', async () => {
    const editor = await editorOn()
    const noFile = await editor.post('/api/imports').field('type', 'parts')
    expect(noFile.status).toBe(400)
    expect(noFile.body.error.message).toContain('form field "file"')
    const badType = await uploadCsv(editor, 'a\n1\n', { type: 'gaskets' as 'parts' })
    expect(badType.status).toBe(400)
    expect(badType.body.error.details[0]).toMatchObject({ path: 'type', message: 'Type must be parts, links, vehicles or stock.' })
  })
})

describe('imports and exports, permissions', () => {
  it('refuses a tech every import and export route with 403', async () => {
    t = await createTestApp()
    const agent = await t.signIn('tech')
    const before = await databaseSnapshot(t.dataSource)
    expect((await uploadCsv(agent, 'part_number,kind,name\nTM-X-1,other,W\n', { type: 'parts', mode: 'commit' })).status).toBe(403)
    expect((await agent.get('/api/imports')).status).toBe(403)
    expect((await agent.post('/api/imports/1/revert')).status).toBe(403)
    expect((await agent.get('/api/export/parts.csv')).status).toBe(403)
    expect(await databaseSnapshot(t.dataSource)).toEqual(before)
  })

  it('refuses a counter every route for the catalogue files (the stock book is theirs, imports-counter.test.ts)', async () => {
    t = await createTestApp()
    const agent = await t.signIn('counter')
    const before = await databaseSnapshot(t.dataSource)
    expect((await uploadCsv(agent, 'part_number,kind,name\nTM-X-1,other,W\n', { type: 'parts', mode: 'commit' })).status).toBe(403)
    // The demo's catalogue batches are the editors'.
    expect((await agent.get('/api/imports')).body).toEqual([])
    expect((await agent.post('/api/imports/1/revert')).status).toBe(403)
    expect((await agent.get('/api/export/parts.csv')).status).toBe(403)
    expect(await databaseSnapshot(t.dataSource)).toEqual(before)
  })

  it('answers 401 without a session', async () => {
    t = await createTestApp()
    const { default: request } = await import('supertest')
    expect((await request(t.app).get('/api/imports')).status).toBe(401)
    expect((await request(t.app).get('/api/export/links.csv')).status).toBe(401)
  })

  it('lets an administrator import', async () => {
    t = await createTestApp()
    const admin = await t.signIn('admin')
    expect((await uploadCsv(admin, 'part_number,kind,name\nTM-X-1,other,W\n', { type: 'parts', mode: 'commit' })).status).toBe(201)
  })
})

describe('POST /api/imports with progress', () => {
  it('streams read progress and ends with the result line carrying the real status', async () => {
    const editor = await editorOn()
    const response = await uploadCsv(editor, 'part_number,kind,name\nTM-X-1,other,Washer\n', {
      type: 'parts',
      mode: 'commit',
      progress: true,
    })
    expect(response.status).toBe(200)
    expect(response.headers['content-type']).toContain('application/x-ndjson')
    const lines = response.text
      .trim()
      .split('\n')
      .map((line) => importStreamLineSchema.parse(JSON.parse(line)))
    expect(lines[0]).toMatchObject({ type: 'progress', phase: 'read' })
    expect(lines.some((line) => line.type === 'progress' && line.phase === 'write')).toBe(true)
    expect(lines.at(-1)).toMatchObject({ type: 'result', status: 201, body: { counts: { created: 1 } } })
  })

  it('ends with an error line when the commit is refused', async () => {
    const editor = await editorOn()
    const response = await uploadCsv(editor, 'part_number,kind,name\nTM-X-1,flux,Washer\n', {
      type: 'parts',
      mode: 'commit',
      progress: true,
    })
    const last = importStreamLineSchema.parse(JSON.parse(response.text.trim().split('\n').at(-1)!))
    expect(last).toMatchObject({ type: 'error', status: 422, body: { error: { code: 'rows_rejected' } } })
  })
})
