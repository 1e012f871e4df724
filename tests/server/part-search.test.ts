import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { uploadCsv } from '../helpers/imports'
import { createTestApp, type TestApp } from '../helpers/test-app'

let t: TestApp
let editor: Awaited<ReturnType<TestApp['signIn']>>
const HEADER = 'part_number,kind,name,family,casting_marks'
const numbers = (body: { items: { partNumber: string }[] }) => body.items.map((item) => item.partNumber)

beforeAll(async () => {
  t = await createTestApp()
  editor = await t.signIn('editor')
  const csv = [
    HEADER,
    'ZQ-2000,other,Adapter plate for zq100 pumps,TK20V,',
    'ZQ-1001,other,Pump housing,TK20V,',
    'ZQ-100,other,Water pump gasket,TK20V,',
    'ZQ-3000,other,Coolant elbow,TK20V,ZQ-100-B',
  ].join('\n')
  expect((await uploadCsv(editor, csv, { type: 'parts', mode: 'commit' })).status).toBe(201)
})
afterAll(() => t.close())

describe('GET /api/parts?q= ranking', () => {
  it('puts the exact number first, then numbers and marks it starts, then parts whose words it starts', async () => {
    const response = await editor.get('/api/parts?q=zq100')
    expect(numbers(response.body)).toEqual(['ZQ-100', 'ZQ-1001', 'ZQ-3000', 'ZQ-2000'])
    expect(response.body.total).toBe(4)
  })

  it('finds by the start of every word given, in name or family, and not by the middle of a word', async () => {
    expect(numbers((await editor.get('/api/parts?q=pump&kind=other')).body)).toEqual(['ZQ-100', 'ZQ-1001', 'ZQ-2000'])
    expect(numbers((await editor.get('/api/parts?q=wat pu')).body)).toEqual(['ZQ-100'])
    expect((await editor.get('/api/parts?q=ump')).body.total).toBe(0)
  })

  it('pages the ranked answer with an honest total', async () => {
    const first = await editor.get('/api/parts?q=zq&pageSize=3')
    const second = await editor.get('/api/parts?q=zq&pageSize=3&page=2')
    expect(first.body.total).toBe(4)
    expect([...numbers(first.body), ...numbers(second.body)]).toEqual(['ZQ-100', 'ZQ-1001', 'ZQ-2000', 'ZQ-3000'])
  })
})

describe('the word index follows imports', () => {
  it('finds a part by its new name after an import renames it, by its old name again after the import is reverted', async () => {
    const rename = await uploadCsv(editor, `${HEADER}\nZQ-3000,other,Thermostat outlet,TK20V,ZQ-100-B\n`, { type: 'parts', mode: 'commit' })
    expect(rename.status).toBe(201)
    expect(numbers((await editor.get('/api/parts?q=thermostat')).body)).toEqual(['ZQ-3000'])
    expect((await editor.get('/api/parts?q=coolant')).body.total).toBe(0)
    expect((await editor.post(`/api/imports/${rename.body.batchId}/revert`)).status).toBe(200)
    expect(numbers((await editor.get('/api/parts?q=coolant')).body)).toEqual(['ZQ-3000'])
    expect((await editor.get('/api/parts?q=thermostat')).body.total).toBe(0)
  })
})
