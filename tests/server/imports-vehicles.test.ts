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

const VEHICLE_TABLES = ['vehicle_application', 'vehicle_original']
const vehicleSnapshot = () => catalogueSnapshot(t.dataSource, VEHICLE_TABLES)
const cellsOf = (text: string) => Papa.parse<string[]>(text.replace(/^\uFEFF/, ''), { skipEmptyLines: true }).data
const exported = async () => (await editor.get('/api/export/vehicles.csv')).text.replace(/^\uFEFF/, '')
type Vehicle = { id: number; body: string; market: string; originals: { slot: string; partNumber: string }[] }
const vehiclesOf = async (query: string) => (await editor.get(`/api/vehicles?${query}`)).body as Vehicle[]
const originalOf = (vehicle: Vehicle | undefined, slot: string) => vehicle?.originals.find((o) => o.slot === slot)?.partNumber

describe('GET /api/export/vehicles.csv', () => {
  it('writes every application with one column per slot holding its original part number', async () => {
    const rows = cellsOf(await exported())
    expect(rows[0]!.slice(0, 9)).toEqual([
      'year_from',
      'year_to',
      'make',
      'model',
      'body',
      'market',
      'engine_family',
      'block',
      'crank_pulley',
    ])
    expect(rows[0]).toContain('head_gasket')
    expect(rows).toHaveLength(6)
    const early = rows.find((row) => row[0] === '1990')!
    expect(early.slice(0, 7)).toEqual(['1990', '1995', 'Talmark', 'Tarn', '3-door hatchback', 'home', 'TK18'])
    expect(early[rows[0]!.indexOf('head')]).toBe('TM-HD-1800')
  })
})

describe('POST /api/imports, vehicles', () => {
  it('finds nothing to change in its own export, and committing it changes no application', async () => {
    const csv = await exported()
    const preview = await uploadCsv(editor, csv, { type: 'vehicles' })
    expect(preview.status, JSON.stringify(preview.body)).toBe(200)
    expect(preview.body).toMatchObject({ counts: { created: 0, updated: 0, unchanged: 5, rejected: 0 }, errors: [], changes: [] })
    const before = await vehicleSnapshot()
    expect((await uploadCsv(editor, csv, { type: 'vehicles', mode: 'commit' })).status).toBe(201)
    expect(await vehicleSnapshot()).toEqual(before)
  })

  it('reports every problem of every bad row in the preview and writes nothing on commit', async () => {
    const csv = [
      'year_from,year_to,make,model,body,engine_family,block,head',
      '1990,1995,Talmark,Tarn,3-door hatchback,TK18,TM-BL-1800,TM-HD-9999',
      '1990,1995,Talmark,Tarn,estate,TK18,TM-HD-1800,TM-BL-1800',
      '1997,1994,Talmark,Kestle,,TK18,,',
      '19x0,1995,,Kestle,,,,',
      '1990,1995,Talmark,Kestle,,TK18,tm-bl-1800,',
      '1998,2001,Talmark,Kestle,saloon,TK18,TM-BL-1800,TM-HD-1810',
    ].join('\n')
    const before = await catalogueSnapshot(t.dataSource, [...VEHICLE_TABLES, 'import_batch'])
    const preview = await uploadCsv(editor, csv, { type: 'vehicles' })
    expect(preview.status).toBe(200)
    expect(preview.body.counts).toEqual({ created: 1, updated: 0, unchanged: 0, rejected: 5 })
    const issues = preview.body.errors as { row: number; column: string; message: string }[]
    const at = (row: number) => issues.filter((issue) => issue.row === row).map((issue) => [issue.column, issue.message])
    expect(at(2)).toEqual([['head', expect.stringContaining('No part TM-HD-9999 in the catalogue')]])
    expect(at(3)).toEqual([
      ['block', 'TM-HD-1800 is a head part, not a cylinder block.'],
      ['head', 'TM-BL-1800 is a block part, not a cylinder head.'],
    ])
    expect(at(4)).toEqual([['year_to', expect.stringContaining('cannot come before the first')]])
    expect(at(5)).toEqual([
      ['year_from', expect.stringContaining('"19x0" is not a four-digit year')],
      ['make', 'make is required.'],
      ['engine_family', 'engine_family is required.'],
    ])
    expect(at(6)).toEqual([['block', expect.stringContaining('(did you mean TM-BL-1800?)')]])

    const refused = await uploadCsv(editor, csv, { type: 'vehicles', mode: 'commit' })
    expect(refused.status).toBe(422)
    expect(await catalogueSnapshot(t.dataSource, [...VEHICLE_TABLES, 'import_batch'])).toEqual(before)
  })

  it('adds an application, swaps one original part of a known one, and keeps the slots the file has no column for', async () => {
    const csv = [
      'year_from,year_to,make,model,engine_family,head,ecu',
      '1990,1995,Talmark,Tarn,TK18,TM-HD-1810,TM-EC-1800',
      '1998,2001,Talmark,Kestle,TK18,TM-HD-1810,',
    ].join('\n')
    const preview = await uploadCsv(editor, csv, { type: 'vehicles' })
    expect(preview.body.counts).toEqual({ created: 1, updated: 1, unchanged: 0, rejected: 0 })
    expect(preview.body.changes).toContainEqual({
      row: 2,
      key: '1990–1995 Talmark Tarn 3-door hatchback (home), TK18',
      action: 'update',
      fields: [{ field: 'head', before: 'TM-HD-1800', after: 'TM-HD-1810' }],
    })
    expect((await uploadCsv(editor, csv, { type: 'vehicles', mode: 'commit' })).status).toBe(201)
    const [tarn] = await vehiclesOf('year=1992&make=Talmark&model=Tarn')
    expect(originalOf(tarn, 'head')).toBe('TM-HD-1810')
    expect(originalOf(tarn, 'block')).toBe('TM-BL-1800')
    expect(tarn?.originals).toHaveLength(18)
    const [kestle] = await vehiclesOf('year=1999&make=Talmark&model=Kestle')
    expect(kestle).toMatchObject({ body: '', market: '' })
    expect(kestle?.originals).toEqual([{ slot: 'head', partNumber: 'TM-HD-1810', name: expect.any(String) }])
  })

  it('asks for body and market when the file leaves them out and that names more than one application', async () => {
    const editorAgent = editor
    const add = 'year_from,year_to,make,model,body,market,engine_family\n1992,1995,Talmark,Vell,estate,export,TK20V\n'
    expect((await uploadCsv(editorAgent, add, { type: 'vehicles', mode: 'commit' })).status).toBe(201)
    const preview = await uploadCsv(
      editorAgent,
      'year_from,year_to,make,model,engine_family,head\n1992,1995,Talmark,Vell,TK20V,TM-HD-2000\n',
      {
        type: 'vehicles',
      },
    )
    expect(preview.body.errors).toEqual([{ row: 2, column: 'body', message: expect.stringContaining('matches 2 applications') }])
  })

  it('says a stock file is not a vehicles file', async () => {
    const response = await uploadCsv(editor, 'part_number,site,condition,price\nTM-HD-2000,Northgate counter,new,10\n', {
      type: 'vehicles',
    })
    expect(response.status).toBe(400)
    expect(response.body.error).toMatchObject({
      code: 'wrong_file',
      message: expect.stringContaining('header of a stock file, not a vehicles file'),
    })
  })
})

describe('POST /api/imports/:id/revert, vehicles', () => {
  it('puts the applications and their original parts back exactly', async () => {
    const before = await vehicleSnapshot()
    const csv =
      'year_from,year_to,make,model,engine_family,head\n1990,1995,Talmark,Tarn,TK18,TM-HD-1810\n1998,2001,Talmark,Kestle,TK18,TM-HD-1810\n'
    const { batchId } = (await uploadCsv(editor, csv, { type: 'vehicles', mode: 'commit' })).body as { batchId: number }
    const reverted = await editor.post(`/api/imports/${batchId}/revert`)
    expect(reverted.status).toBe(200)
    expect(reverted.body).toMatchObject({ type: 'vehicles', status: 'reverted' })
    expect(await vehicleSnapshot()).toEqual(before)
  })

  it('is refused for a parts batch whose new part a later vehicles batch names as original', async () => {
    const parts = (await uploadCsv(editor, 'part_number,kind,name\nTM-HD-2100,head,New head\n', { type: 'parts', mode: 'commit' }))
      .body as {
      batchId: number
    }
    const vehicles = (
      await uploadCsv(editor, 'year_from,year_to,make,model,engine_family,head\n1998,2001,Talmark,Kestle,TK18,TM-HD-2100\n', {
        type: 'vehicles',
        mode: 'commit',
      })
    ).body as { batchId: number }
    const refused = await editor.post(`/api/imports/${parts.batchId}/revert`)
    expect(refused.status).toBe(409)
    expect(refused.body.error.details).toEqual([
      { path: `batch ${vehicles.batchId}`, message: expect.stringContaining("names parts this batch added as a vehicle's original parts") },
    ])
    expect((await editor.post(`/api/imports/${vehicles.batchId}/revert`)).status).toBe(200)
    expect((await editor.post(`/api/imports/${parts.batchId}/revert`)).status).toBe(200)
  })
})
