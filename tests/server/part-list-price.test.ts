import Papa from 'papaparse'
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

const HEADER = 'part_number,kind,name,list_price'
const cellsOf = (text: string) => Papa.parse<string[]>(text.replace(/^\uFEFF/, ''), { skipEmptyLines: true }).data
type Line = { kind: string; partNumber?: string; unitPriceCents: number; toOrder: boolean; stockItemId?: number; description: string }

describe('list price on parts', () => {
  it('reads list_price as a decimal into whole cents, shows it on the part and in the preview', async () => {
    const csv = `${HEADER}\nTM-XG-0001,other,Gasket kit,129.9\nTM-XG-0002,other,Seal kit,1234.05\nTM-XG-0003,other,Clip,\n`
    const preview = await uploadCsv(editor, csv, { type: 'parts' })
    expect(preview.body.counts).toMatchObject({ created: 3, rejected: 0 })
    const created = preview.body.changes.find((change: { key: string }) => change.key === 'TM-XG-0001')
    expect(created.fields).toContainEqual({ field: 'list_price', before: '', after: '129.90' })
    expect((await uploadCsv(editor, csv, { type: 'parts', mode: 'commit' })).status).toBe(201)
    expect((await editor.get('/api/parts/TM-XG-0001')).body.listPriceCents).toBe(12990)
    expect((await editor.get('/api/parts/TM-XG-0002')).body.listPriceCents).toBe(123405)
    expect((await editor.get('/api/parts/TM-XG-0003')).body.listPriceCents).toBeNull()
    // The column is the part's own field, never an attribute.
    expect((await editor.get('/api/parts/TM-XG-0001')).body.attributes).toEqual({})
  })

  it.each([
    ['a negative price', '-3.00'],
    ['more than two decimals', '12.345'],
    ['a currency sign', '€12.00'],
    ['words', 'ask'],
    ['a decimal comma', '"12,50"'],
    ['more than 1,000,000', '1000000.01'],
  ])('rejects %s at the list_price column and writes nothing', async (_what, cell) => {
    const csv = `${HEADER}\nTM-XG-0001,other,Gasket kit,10.00\nTM-XG-0009,other,Odd kit,${cell}\n`
    const preview = await uploadCsv(editor, csv, { type: 'parts' })
    expect(preview.body.counts).toMatchObject({ created: 1, rejected: 1 })
    expect(preview.body.errors).toEqual([
      expect.objectContaining({ row: 3, column: 'list_price', message: expect.stringContaining('not a price') }),
    ])
    const before = await databaseSnapshot(t.dataSource)
    expect((await uploadCsv(editor, csv, { type: 'parts', mode: 'commit' })).status).toBe(422)
    expect(await databaseSnapshot(t.dataSource)).toEqual(before)
  })

  it('keeps the stored price when the file has no list_price column, clears it for an empty cell, and a revert restores it', async () => {
    expect((await editor.get('/api/parts/TM-CG-2000')).body.listPriceCents).toBe(7200)
    await uploadCsv(editor, 'part_number,kind,name,notes\nTM-CG-2000,cam-gear,TK20V cam gear,Renamed notes.\n', {
      type: 'parts',
      mode: 'commit',
    })
    expect((await editor.get('/api/parts/TM-CG-2000')).body.listPriceCents).toBe(7200)
    const before = await catalogueSnapshot(t.dataSource)
    const cleared = await uploadCsv(editor, `${HEADER}\nTM-CG-2000,cam-gear,TK20V cam gear,\n`, { type: 'parts', mode: 'commit' })
    expect(cleared.body.counts.updated).toBe(1)
    expect((await editor.get('/api/parts/TM-CG-2000')).body.listPriceCents).toBeNull()
    expect((await editor.post(`/api/imports/${cleared.body.batchId}/revert`)).status).toBe(200)
    expect(await catalogueSnapshot(t.dataSource)).toEqual(before)
    expect((await editor.get('/api/parts/TM-CG-2000')).body.listPriceCents).toBe(7200)
  })

  it('exports list_price as a decimal after the fixed columns, and importing the export changes nothing', async () => {
    const exported = (await editor.get('/api/export/parts.csv')).text
    const [header, ...rows] = cellsOf(exported)
    expect(header!.indexOf('list_price')).toBe(header!.indexOf('superseded_numbers') + 1)
    const camGear = rows.find((row) => row[0] === 'TM-CG-2000')!
    expect(camGear[header!.indexOf('list_price')]).toBe('72.00')
    expect(rows.find((row) => row[0] === 'TM-HD-2000')![header!.indexOf('list_price')]).toBe('')
    const before = await catalogueSnapshot(t.dataSource)
    const again = await uploadCsv(editor, exported, { type: 'parts', mode: 'commit' })
    expect(again.body.counts).toMatchObject({ created: 0, updated: 0, rejected: 0 })
    expect(await catalogueSnapshot(t.dataSource)).toEqual(before)
  })

  it('prices a part to order at its list price on a quote, and one without a list price on request', async () => {
    const tech = await t.signIn('tech')
    const quote = (
      await tech.post('/api/quotes').send({ slots: { head: 'TM-HD-2000', 'cam-gear': 'TM-CG-2000', 'crank-pulley': 'TM-CP-2000' } })
    ).body as { lines: Line[]; totals: { partsCents: number } }
    const camGear = quote.lines.find((line) => line.partNumber === 'TM-CG-2000' && line.kind === 'part')!
    // No cam gear on any demo shelf (data/demo/stock.json): ordered at the demo list price of 72.00.
    expect(camGear).toMatchObject({ unitPriceCents: 7200, toOrder: true, description: 'TK20V cam gear' })
    expect(camGear.stockItemId).toBeUndefined()
    // A unit on the shelf keeps its own price.
    expect(quote.lines.find((line) => line.partNumber === 'TM-HD-2000' && line.kind === 'part')).toMatchObject({
      unitPriceCents: 48900,
      toOrder: false,
    })
    await uploadCsv(editor, `${HEADER}\nTM-CP-2000,crank-pulley,TK20V crank pulley,\n`, { type: 'parts', mode: 'commit' })
    const unpriced = (await tech.post('/api/quotes').send({ slots: { 'crank-pulley': 'TM-CP-2000' } })).body as { lines: Line[] }
    expect(unpriced.lines.find((line) => line.partNumber === 'TM-CP-2000')).toMatchObject({ unitPriceCents: 0, toOrder: true })
  })
})
