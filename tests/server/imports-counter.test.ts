import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { uploadCsv } from '../helpers/imports'
import { createTestApp, type TestApp } from '../helpers/test-app'

let t: TestApp
let counter: Awaited<ReturnType<TestApp['signIn']>>
let editor: Awaited<ReturnType<TestApp['signIn']>>
beforeAll(async () => {
  t = await createTestApp()
  counter = await t.signIn('counter')
  editor = await t.signIn('editor')
})
afterAll(() => t.close())

const STOCK = 'part_number,site,condition,price,location,label\nTM-HD-2000,Northgate counter,new,512.00,Shelf C2,CTR-0001\n'
const PARTS = 'part_number,kind,name\nTM-X-77,other,Counter spacer\n'

describe('imports at the counter: the stock book, nothing else', () => {
  let stockBatch = 0
  let partsBatch = 0

  it('lets the counter preview, commit and list a stock file, and shows it none of the editors’ batches', async () => {
    const preview = await uploadCsv(counter, STOCK, { type: 'stock' })
    expect(preview.status, JSON.stringify(preview.body)).toBe(200)
    expect(preview.body.counts).toMatchObject({ created: 1, rejected: 0 })
    const commit = await uploadCsv(counter, STOCK, { type: 'stock', mode: 'commit' })
    expect(commit.status, JSON.stringify(commit.body)).toBe(201)
    stockBatch = commit.body.batchId as number
    partsBatch = (await uploadCsv(editor, PARTS, { type: 'parts', mode: 'commit' })).body.batchId as number

    const seen = (await counter.get('/api/imports')).body as { id: number; type: string }[]
    expect(seen.map((batch) => batch.id)).toContain(stockBatch)
    expect(seen.every((batch) => batch.type === 'stock')).toBe(true)
    expect(((await editor.get('/api/imports')).body as { id: number }[]).map((batch) => batch.id)).toEqual(
      expect.arrayContaining([stockBatch, partsBatch]),
    )
  })

  it('refuses the counter a parts, links or vehicles file, their exports and their reverts, with 403 and nothing written', async () => {
    for (const type of ['parts', 'links', 'vehicles'] as const) {
      const response = await uploadCsv(counter, PARTS.replace('TM-X-77', 'TM-X-88'), { type, mode: 'commit' })
      expect(response.status).toBe(403)
      expect(response.body.error.message).toContain('stock files only')
    }
    expect((await counter.get('/api/parts/TM-X-88')).status).toBe(404)
    expect((await counter.get('/api/export/parts.csv')).status).toBe(403)
    expect((await counter.post(`/api/imports/${partsBatch}/revert`)).status).toBe(403)
    expect((await editor.get('/api/parts/TM-X-77')).status).toBe(200)
  })

  it('lets the counter export the stock book and revert its own stock batch', async () => {
    const exported = await counter.get('/api/export/stock.csv')
    expect(exported.status).toBe(200)
    expect(exported.text).toContain('CTR-0001')
    const reverted = await counter.post(`/api/imports/${stockBatch}/revert`)
    expect(reverted.status, JSON.stringify(reverted.body)).toBe(200)
    expect((await counter.get('/api/stock/label/CTR-0001')).status).toBe(404)
  })

  it('keeps the imports closed to a tech', async () => {
    const tech = await t.signIn('tech')
    expect((await tech.get('/api/imports')).status).toBe(403)
    expect((await uploadCsv(tech, STOCK, { type: 'stock' })).status).toBe(403)
  })
})
