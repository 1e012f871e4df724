import Papa from 'papaparse'
import { afterEach, beforeEach, describe, expect, it } from 'vitest'
import { catalogueSnapshot, uploadCsv } from '../helpers/imports'
import { createTestApp, type TestApp } from '../helpers/test-app'

let t: TestApp
let editor: Awaited<ReturnType<TestApp['signIn']>>
beforeEach(async () => {
  t = await createTestApp()
  editor = await t.signIn('editor')
})
afterEach(() => t.close())

const cellsOf = (text: string) => Papa.parse<string[]>(text.replace(/^\uFEFF/, ''), { skipEmptyLines: true }).data

describe('GET /api/export/*.csv', () => {
  it('sends a UTF-8 CSV attachment in the import format', async () => {
    const response = await editor.get('/api/export/parts.csv')
    expect(response.status).toBe(200)
    expect(response.headers['content-type']).toBe('text/csv; charset=utf-8')
    expect(response.headers['content-disposition']).toMatch(/^attachment; filename="?fitwright-parts-\d{4}-\d{2}-\d{2}\.csv/)
    expect(
      response.text.startsWith(
        '\uFEFFpart_number,kind,name,family,year_from,year_to,notes,casting_marks,stamped_codes,superseded_numbers,',
      ),
    ).toBe(true)
    const rows = cellsOf(response.text)
    expect(rows.find((row) => row[0] === 'TM-BL-2000')).toBeDefined()
  })

  it('exports approved links and identities, not links still awaiting review', async () => {
    const rows = cellsOf((await editor.get('/api/export/links.csv')).text)
    expect(rows[0]).toEqual(['from_part', 'to_part', 'relation', 'modifications', 'note', 'source'])
    expect(rows).toContainEqual([
      'TM-BL-2000',
      'TM-BL-2001',
      'identical',
      '',
      'Same casting; the late number adds a revised core plug.',
      'demo',
    ])
    expect(rows.some((row) => row.includes('TM-EM-2000H'))).toBe(false)
  })

  it('neutralises cells that start with = + - @ tab or carriage return, as OWASP advises', async () => {
    const csv = [
      'part_number,kind,name,notes,deck_clearance_mm,supplier',
      'TM-X-1,block,=HYPERLINK("http://example.test"),+1 more,-0.5,@SUM(A1)',
      'TM-X-2,other,Tab start,"\tindented",,',
      'TM-X-3,other,Return start,"\rcarriage",,',
    ].join('\n')
    expect((await uploadCsv(editor, csv, { type: 'parts', mode: 'commit' })).status).toBe(201)
    const rows = cellsOf((await editor.get('/api/export/parts.csv')).text)
    const header = rows[0]!
    const x1 = rows.find((row) => row[0] === 'TM-X-1')!
    const x2 = rows.find((row) => row[0] === 'TM-X-2')!
    const x3 = rows.find((row) => row[0] === 'TM-X-3')!
    expect(x1[header.indexOf('name')]).toBe(`'=HYPERLINK("http://example.test")`)
    expect(x1[header.indexOf('notes')]).toBe("'+1 more")
    expect(x1[header.indexOf('deck_clearance_mm')]).toBe("'-0.5")
    expect(x1[header.indexOf('supplier')]).toBe("'@SUM(A1)")
    expect(x2[header.indexOf('notes')]).toBe("'\tindented")
    expect(x3[header.indexOf('notes')]).toBe("'\rcarriage")
    for (const row of rows) for (const cell of row) expect(cell).not.toMatch(/^[=+\-@\t\r]/)
  })

  it('changes nothing when its own export is imported again (parts, then links)', async () => {
    await uploadCsv(editor, 'part_number,kind,name,notes,deck_clearance_mm\nTM-X-1,block,=1+1,"\'quoted, and ""more""",-0.5\n', {
      type: 'parts',
      mode: 'commit',
    })
    const before = await catalogueSnapshot(t.dataSource)
    for (const type of ['parts', 'links'] as const) {
      const exported = (await editor.get(`/api/export/${type}.csv`)).text
      const again = await uploadCsv(editor, exported, { type, mode: 'commit' })
      expect(again.status, JSON.stringify(again.body)).toBe(201)
      expect(again.body.counts).toMatchObject({ created: 0, updated: 0, rejected: 0 })
      expect(again.body.counts.unchanged).toBe(cellsOf(exported).length - 1)
    }
    expect(await catalogueSnapshot(t.dataSource)).toEqual(before)
    expect((await editor.get('/api/parts/TM-X-1')).body).toMatchObject({
      name: '=1+1',
      notes: '\'quoted, and "more"',
      attributes: { deckClearanceMm: -0.5 },
    })
  })
})
