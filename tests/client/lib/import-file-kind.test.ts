import { describe, expect, it } from 'vitest'
import { fileKindHint, headerCells } from '@/lib/import-file-kind'

describe('headerCells', () => {
  it.each([
    ['a comma file with a byte-order mark', '\uFEFFpart_number,site,condition,price\nTM-HD-2000,Northgate counter,new,10\n'],
    ['a semicolon file with a quoted header', '"part_number";"site";"condition";"price"\r\nTM-HD-2000;Northgate counter;new;10\r\n'],
    ['a tab file', 'part_number\tsite\tcondition\tprice\n'],
  ])('reads the first row of %s', (_what, text) => {
    expect(headerCells(text)).toEqual(['part_number', 'site', 'condition', 'price'])
  })
})

describe('fileKindHint', () => {
  it.each([
    [['part_number', 'site', 'condition', 'price'], 'vehicles', 'stock', 'This looks like a stock file, not a vehicles file.'],
    [
      ['Year From', 'year_to', 'make', 'model', 'engine_family', 'head'],
      'parts',
      'vehicles',
      'This looks like a vehicles file, not a parts file.',
    ],
    [['part_number', 'kind', 'name', 'notes'], 'stock', 'parts', 'This looks like a parts file, not a stock file.'],
    [['from_part', 'to_part', 'relation'], 'stock', 'links', 'This looks like a links file, not a stock file.'],
  ] as const)('names the kind a %j header is when %s was chosen', (header, chosen, looksLike, message) => {
    expect(fileKindHint([...header], chosen)).toEqual({ looksLike, message })
  })

  it.each([
    ['the chosen kind', ['part_number', 'site', 'condition', 'price'], 'stock'],
    ['no complete kind', ['part_number', 'name'], 'parts'],
    ['a header that is no kind at all', ['TM-X-1', 'block', 'Odd block'], 'parts'],
  ] as const)('says nothing for %s', (_what, header, chosen) => {
    expect(fileKindHint([...header], chosen)).toBeNull()
  })
})
