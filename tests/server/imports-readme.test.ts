import { readFileSync } from 'node:fs'
import path from 'node:path'
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { uploadCsv } from '../helpers/imports'
import { createTestApp, type TestApp } from '../helpers/test-app'

/** The README's examples of the format, so the documentation cannot drift from what the importer takes. */
const readme = readFileSync(path.resolve(import.meta.dirname, '../../README.md'), 'utf8')
const section = readme.slice(readme.indexOf('## CSV import and export'), readme.indexOf('## Architecture'))
const [partsExample, linksExample, vehiclesExample, stockExample] = [...section.matchAll(/```csv\n([\s\S]*?)```/g)].map(
  (match) => match[1]!,
)

let t: TestApp
beforeAll(async () => {
  t = await createTestApp()
})
afterAll(() => t.close())

describe('the README examples of the CSV format', () => {
  it('import as documented: the parts file, then the links file, without a rejected row', async () => {
    const editor = await t.signIn('editor')
    expect(partsExample).toBeDefined()
    expect(linksExample).toBeDefined()
    const parts = await uploadCsv(editor, partsExample!, { type: 'parts', mode: 'commit' })
    expect(parts.status, JSON.stringify(parts.body)).toBe(201)
    expect(parts.body.counts).toMatchObject({ created: 2, rejected: 0 })
    const links = await uploadCsv(editor, linksExample!, { type: 'links', mode: 'commit' })
    expect(links.status, JSON.stringify(links.body)).toBe(201)
    expect(links.body.counts).toMatchObject({ created: 3, rejected: 0 })
  })

  it('import as documented: the vehicles file and the stock file, without a rejected row', async () => {
    const editor = await t.signIn('editor')
    const vehicles = await uploadCsv(editor, vehiclesExample!, { type: 'vehicles', mode: 'commit' })
    expect(vehicles.status, JSON.stringify(vehicles.body)).toBe(201)
    expect(vehicles.body.counts).toMatchObject({ created: 1, rejected: 0 })
    const stock = await uploadCsv(editor, stockExample!, { type: 'stock', mode: 'commit' })
    expect(stock.status, JSON.stringify(stock.body)).toBe(201)
    expect(stock.body.counts).toMatchObject({ created: 2, rejected: 0 })
  })
})
