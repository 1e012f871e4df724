import Papa from 'papaparse'
import { afterEach, beforeEach, describe, expect, it } from 'vitest'
import { catalogueSnapshot, uploadCsv } from '../helpers/imports'
import { createTestApp, type TestApp } from '../helpers/test-app'
import { jobNumber } from '../../shared/quote-job-number'

let t: TestApp
let editor: Awaited<ReturnType<TestApp['signIn']>>
beforeEach(async () => {
  t = await createTestApp()
  editor = await t.signIn('editor')
})
afterEach(() => t.close())

const HEADER = 'part_number,site,condition,price,location,mileage_km,donor_vin,donor_year,core_charge,status,notes,label'
const STOCK_TABLES = ['stock_item', 'import_batch', 'import_change']
const stockSnapshot = () => catalogueSnapshot(t.dataSource, STOCK_TABLES)
const cellsOf = (text: string) => Papa.parse<string[]>(text.replace(/^\uFEFF/, ''), { skipEmptyLines: true }).data
const exported = async () => (await editor.get('/api/export/stock.csv')).text.replace(/^\uFEFF/, '')
const headsInStock = async (block: string) => {
  const body = (await editor.get(`/api/parts/${block}/fits?pageSize=200&kind=head`)).body as {
    groups: { results: { part: { partNumber: string }; stock: { available: number; minPriceCents: number | null } }[] }[]
  }
  return new Map(body.groups.flatMap((group) => group.results).map((fit) => [fit.part.partNumber, fit.stock]))
}

describe('GET /api/export/stock.csv', () => {
  it('writes every unit in the stock import format, the price as a decimal and a used unit with its grade', async () => {
    const rows = cellsOf(await exported())
    expect(rows[0]).toEqual([
      'part_number',
      'site',
      'condition',
      'price',
      'core_charge',
      'location',
      'mileage_km',
      'donor_vin',
      'donor_year',
      'status',
      'notes',
      'label',
    ])
    expect(rows).toHaveLength(9)
    expect(rows).toContainEqual([
      'TM-HD-1800',
      'Hollin yard, lot B',
      'used B',
      '125.00',
      '0.00',
      'Rack H4',
      '164000',
      '1ZZAA11AXS1000000',
      '1995',
      'available',
      '',
      'HY-B-0441',
    ])
    expect(rows).toContainEqual(expect.arrayContaining(['TM-HD-2000R', 'remanufactured', '319.00', '60.00', 'NG-000113']))
  })
})

describe('POST /api/imports, stock', () => {
  it('finds nothing to change in its own export, and committing it changes no unit', async () => {
    const csv = await exported()
    const preview = await uploadCsv(editor, csv, { type: 'stock' })
    expect(preview.status, JSON.stringify(preview.body)).toBe(200)
    expect(preview.body).toMatchObject({ counts: { created: 0, updated: 0, unchanged: 8, rejected: 0 }, errors: [], changes: [] })
    const before = await catalogueSnapshot(t.dataSource, ['stock_item'])
    expect((await uploadCsv(editor, csv, { type: 'stock', mode: 'commit' })).status).toBe(201)
    expect(await catalogueSnapshot(t.dataSource, ['stock_item'])).toEqual(before)
  })

  it('reports every problem of every bad row in the preview and writes nothing on commit', async () => {
    const csv = [
      HEADER,
      'TM-NOPE-1,Southgate counter,new,10.00,,,,,,,,',
      'TM-HD-2000,Southgate counter,new,10.00,,,,,,,,',
      'TM-HD-2000,Northgate counter,new,-5.00,,,,,,,,',
      'TM-HD-2000,Northgate counter,new,about ten,,,,,,,,',
      // 1ZZAA11AXS1000000 carries X in position 9; a 5 there does not agree with the other positions (49 CFR 565.15).
      'TM-HD-1800,"Hollin yard, lot B",used B,90,,,1ZZAA11A5S1000000,1995,,,,',
      'TM-HD-1800,"Hollin yard, lot B",used B,90,,-3,1ZZAA11A5S1000000,19x5,,,,',
      'TM-HD-2000,Northgate counter,new,10.00,,,,,,reserved,,NG-NEW-1',
      'TM-HD-2000,Northgate counter,new A,10.00,,,,,twelve,gone,,',
      'TM-HD-2000,Northgate counter,new,479.50,Aisle 3,,,,,,,NG-NEW-2',
    ].join('\n')
    const before = await stockSnapshot()
    const preview = await uploadCsv(editor, csv, { type: 'stock' })
    expect(preview.status).toBe(200)
    expect(preview.body.counts).toEqual({ created: 1, updated: 0, unchanged: 0, rejected: 8 })
    const issues = preview.body.errors as { row: number; column: string; message: string }[]
    const at = (row: number) => issues.filter((issue) => issue.row === row).map((issue) => [issue.column, issue.message])
    expect(at(2)).toEqual([
      ['part_number', expect.stringContaining('No part TM-NOPE-1 in the catalogue')],
      ['site', expect.stringContaining('No site named "Southgate counter"')],
    ])
    expect(at(3)).toEqual([['site', expect.stringContaining('No site named "Southgate counter"')]])
    expect(at(4)).toEqual([['price', expect.stringContaining('cannot be negative')]])
    expect(at(5)).toEqual([['price', expect.stringContaining('"about ten" is not an amount')]])
    expect(at(6)).toEqual([['donor_vin', 'The check digit (position 9) is 5, but the other positions give X; read the VIN again.']])
    expect(at(7)).toEqual([
      ['mileage_km', expect.stringContaining('cannot be negative')],
      ['donor_vin', expect.stringContaining('check digit (position 9) is 5')],
      ['donor_year', expect.stringContaining('"19x5" is not a whole number')],
    ])
    expect(at(8)).toEqual([['status', expect.stringContaining('reserved by accepting a quote')]])
    expect(at(9)).toEqual([
      ['condition', expect.stringContaining('Only used parts carry a grade')],
      ['core_charge', expect.stringContaining('"twelve" is not an amount')],
      ['status', expect.stringContaining('"gone" is not a status')],
    ])

    const refused = await uploadCsv(editor, csv, { type: 'stock', mode: 'commit' })
    expect(refused.status).toBe(422)
    expect(refused.body.error.code).toBe('rows_rejected')
    expect(await stockSnapshot()).toEqual(before)
  })

  it('adds and updates units by label, keeps the values of columns the file lacks, and the shelf answers follow at once', async () => {
    const csv =
      'part_number,site,condition,price,label\nTM-HD-2000,Northgate counter,new,479.50,NG-000112\nTM-HD-2000,Northgate counter,new,455,NG-000200\n'
    const preview = await uploadCsv(editor, csv, { type: 'stock' })
    expect(preview.body.counts).toEqual({ created: 1, updated: 1, unchanged: 0, rejected: 0 })
    expect(preview.body.changes).toContainEqual({
      row: 2,
      key: 'NG-000112',
      action: 'update',
      fields: [{ field: 'price', before: '489.00', after: '479.50' }],
    })
    const committed = await uploadCsv(editor, csv, { type: 'stock', mode: 'commit' })
    expect(committed.status).toBe(201)
    expect((await editor.get('/api/stock/label/NG-000112')).body).toMatchObject({ priceCents: 47950, location: 'Aisle 3, shelf 2' })
    expect((await editor.get('/api/stock/label/NG-000200')).body).toMatchObject({ priceCents: 45500, status: 'available', location: '' })
    expect((await headsInStock('TM-BL-1800')).get('TM-HD-2000')).toMatchObject({ available: 2, minPriceCents: 45500 })
  })

  it('moves a labelled unit to the part its row names, saying which part it was on though the file never names that part', async () => {
    const csv = 'part_number,site,condition,price,label\nTM-HD-2050,Northgate counter,new,489.00,NG-000112\n'
    const preview = await uploadCsv(editor, csv, { type: 'stock' })
    expect(preview.body.changes).toContainEqual({
      row: 2,
      key: 'NG-000112',
      action: 'update',
      fields: [{ field: 'part_number', before: 'TM-HD-2000', after: 'TM-HD-2050' }],
    })
  })

  it('matches unlabelled rows to alike unlabelled units once each, so the same delivery imported twice is one delivery', async () => {
    const csv =
      'part_number,site,condition,price,location\nTM-HG-1800,Northgate counter,new,21.00,Bin 7\nTM-HG-1800,Northgate counter,new,21.00,Bin 7\n'
    expect((await uploadCsv(editor, csv, { type: 'stock', mode: 'commit' })).body.counts).toMatchObject({ created: 2 })
    expect((await uploadCsv(editor, csv, { type: 'stock' })).body.counts).toEqual({ created: 0, updated: 0, unchanged: 2, rejected: 0 })
    const three = `${csv}TM-HG-1800,Northgate counter,new,21.00,Bin 7\n`
    expect((await uploadCsv(editor, three, { type: 'stock' })).body.counts).toEqual({ created: 1, updated: 0, unchanged: 2, rejected: 0 })
  })

  it('will not undo a reservation: a reserved unit stays reserved', async () => {
    const rows = cellsOf(await exported())
    const reserved = rows.find((row) => row[9] === 'reserved')!
    const csv = Papa.unparse([rows[0]!, reserved.map((cell, index) => (index === 9 ? 'available' : cell))])
    const preview = await uploadCsv(editor, csv, { type: 'stock' })
    expect(preview.body.errors).toEqual([{ row: 2, column: 'status', message: expect.stringContaining('held by an accepted quote') }])
  })

  it('says a vehicles or parts file is not a stock file', async () => {
    const vehicles = await uploadCsv(editor, 'year_from,year_to,make,model,engine_family\n1990,1995,Talmark,Tarn,TK18\n', { type: 'stock' })
    expect(vehicles.status).toBe(400)
    expect(vehicles.body.error).toMatchObject({
      code: 'wrong_file',
      message: expect.stringContaining('looks like the header of a vehicles file'),
    })
    const parts = await uploadCsv(editor, 'part_number,kind,name\nTM-X-1,block,Odd block\n', { type: 'stock' })
    expect(parts.body.error).toMatchObject({
      code: 'wrong_file',
      message: expect.stringContaining('header of a parts file, not a stock file'),
    })
  })
})

describe('POST /api/imports/:id/revert, stock', () => {
  it('puts every unit back as it was and the shelf answers with it', async () => {
    const before = await catalogueSnapshot(t.dataSource, ['stock_item'])
    const csv =
      'part_number,site,condition,price,location,label\nTM-HD-2000,Northgate counter,new,479.50,Aisle 4,NG-000112\nTM-HD-2000,Northgate counter,new,455,,NG-000200\n'
    const { batchId } = (await uploadCsv(editor, csv, { type: 'stock', mode: 'commit' })).body as { batchId: number }
    const reverted = await editor.post(`/api/imports/${batchId}/revert`)
    expect(reverted.status).toBe(200)
    expect(reverted.body).toMatchObject({ type: 'stock', status: 'reverted' })
    expect(await catalogueSnapshot(t.dataSource, ['stock_item'])).toEqual(before)
    expect((await headsInStock('TM-BL-1800')).get('TM-HD-2000')).toMatchObject({ available: 1, minPriceCents: 48900 })
  })

  it('is refused while a unit the batch wrote has been sold at the counter since', async () => {
    const { batchId } = (
      await uploadCsv(editor, 'part_number,site,condition,price,label\nTM-HD-2000,Northgate counter,new,455,NG-000200\n', {
        type: 'stock',
        mode: 'commit',
      })
    ).body as { batchId: number }
    const unit = (await editor.get('/api/stock/label/NG-000200')).body as { id: number }
    const counter = await t.signIn('counter')
    expect((await counter.patch(`/api/stock/${unit.id}`).send({ status: 'sold' })).status).toBe(200)
    const refused = await editor.post(`/api/imports/${batchId}/revert`)
    expect(refused.status).toBe(409)
    expect(refused.body.error.details).toEqual([
      { path: 'outside imports', message: expect.stringContaining('sold, reserved or edited at the counter') },
    ])
    expect((await editor.get('/api/stock/label/NG-000200')).body).toMatchObject({ status: 'sold' })
  })

  it('is refused for a parts batch whose new part a later stock batch put on the shelf', async () => {
    const parts = (await uploadCsv(editor, 'part_number,kind,name\nTM-HD-2100,head,New head\n', { type: 'parts', mode: 'commit' }))
      .body as { batchId: number }
    const stock = (
      await uploadCsv(editor, 'part_number,site,condition,price\nTM-HD-2100,Northgate counter,new,300\n', { type: 'stock', mode: 'commit' })
    ).body as { batchId: number }
    const refused = await editor.post(`/api/imports/${parts.batchId}/revert`)
    expect(refused.status).toBe(409)
    expect(refused.body.error.details).toEqual([
      { path: `batch ${stock.batchId}`, message: expect.stringContaining('puts parts this batch added on the shelf') },
    ])
  })
})

describe('POST /api/imports/:id/revert, stock a quote names', () => {
  type Quote = { id: number; createdAt: string; lines: { partNumber?: string; stockItemId?: number }[] }
  const HEAD_JOB = { slots: { block: 'TM-BL-1800', head: 'TM-HD-2000' } }
  const stockOnly = async () => catalogueSnapshot(t.dataSource, ['stock_item'])

  async function importHead(): Promise<{ batchId: number; unitId: number }> {
    const csv = 'part_number,site,condition,price,label\nTM-HD-2000,Northgate counter,new,455,NG-000200\n'
    const { batchId } = (await uploadCsv(editor, csv, { type: 'stock', mode: 'commit' })).body as { batchId: number }
    const unit = (await editor.get('/api/stock/label/NG-000200')).body as { id: number }
    return { batchId, unitId: unit.id }
  }

  async function quoteFor(customer: string): Promise<Quote> {
    const tech = await t.signIn('tech')
    const response = await tech.post('/api/quotes').send({ ...HEAD_JOB, customer })
    expect(response.status, JSON.stringify(response.body)).toBe(201)
    return response.body as Quote
  }

  const headUnitOf = (quote: Quote) => quote.lines.find((line) => line.partNumber === 'TM-HD-2000')?.stockItemId

  it('is refused with a 409 naming a draft quote that takes a unit the batch added, and writes nothing', async () => {
    const { batchId, unitId } = await importHead()
    const quote = await quoteFor('Walk-in, red estate')
    // The imported new head is the cheaper of the two new ones, so the quote takes it.
    expect(headUnitOf(quote)).toBe(unitId)
    const before = await stockOnly()

    const refused = await editor.post(`/api/imports/${batchId}/revert`)

    expect(refused.status).toBe(409)
    expect(refused.body.error.message).toContain(`draft quote ${jobNumber(quote)} for Walk-in, red estate`)
    expect(refused.body.error.details).toEqual([{ path: `quote ${jobNumber(quote)}`, message: expect.stringContaining('TM-HD-2000') }])
    expect(await stockOnly()).toEqual(before)
    expect((await editor.get('/api/imports')).body.find((batch: { id: number }) => batch.id === batchId)).toMatchObject({
      status: 'committed',
    })
  })

  it('names the quote, not the counter, when the quote was accepted and holds the unit', async () => {
    const { batchId } = await importHead()
    const quote = await quoteFor('')
    const tech = await t.signIn('tech')
    expect((await tech.post(`/api/quotes/${quote.id}/accept`)).status).toBe(200)

    const refused = await editor.post(`/api/imports/${batchId}/revert`)

    expect(refused.status).toBe(409)
    expect(refused.body.error.message).toContain(`accepted quote ${jobNumber(quote)} names a unit of TM-HD-2000`)
    expect((await editor.get('/api/stock/label/NG-000200')).body).toMatchObject({ status: 'reserved' })
  })

  it('is refused when the batch changed a unit a quote made before it names, and the change stays', async () => {
    const quote = await quoteFor('Before the price change')
    const demoUnit = headUnitOf(quote)!
    const csv = 'part_number,site,condition,price,label\nTM-HD-2000,Northgate counter,new,499,NG-000112\n'
    const { batchId } = (await uploadCsv(editor, csv, { type: 'stock', mode: 'commit' })).body as { batchId: number }
    expect((await editor.get(`/api/stock/${demoUnit}`)).body).toMatchObject({ label: 'NG-000112', priceCents: 49900 })

    const refused = await editor.post(`/api/imports/${batchId}/revert`)

    expect(refused.status).toBe(409)
    expect(refused.body.error.message).toContain(jobNumber(quote))
    expect((await editor.get(`/api/stock/${demoUnit}`)).body).toMatchObject({ priceCents: 49900 })
  })

  it('goes ahead when the quotes name other units only', async () => {
    const quote = await quoteFor('Took the demo head')
    const { batchId } = await importHead()
    expect(headUnitOf(quote)).not.toBeUndefined()
    const reverted = await editor.post(`/api/imports/${batchId}/revert`)
    expect(reverted.status, JSON.stringify(reverted.body)).toBe(200)
    expect((await editor.get('/api/stock/label/NG-000200')).status).toBe(404)
  })
})
