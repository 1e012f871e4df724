import { createReadStream, readdirSync, readFileSync } from 'node:fs'
import { createRequire } from 'node:module'
import path from 'node:path'
import { describe, expect, it } from 'vitest'
import { readCsvStream } from '../../server/imports/csv/csv-stream'

/*
 * csv-spectrum (npm package csv-spectrum): RFC 4180 edge cases, each a CSV file
 * with the rows it should read as in JSON. Our import parsing layer reads every
 * file of the corpus through readCsvStream, the code path uploads take.
 */
const corpus = path.dirname(createRequire(import.meta.url).resolve('csv-spectrum/package.json'))
const cases = readdirSync(path.join(corpus, 'csvs'))
  .map((file) => path.basename(file, '.csv'))
  .sort()

async function readAsObjects(file: string): Promise<Record<string, string>[]> {
  let header: string[] = []
  const rows: Record<string, string>[] = []
  await readCsvStream(createReadStream(file), {
    maxRows: 1000,
    onHeader: (cells) => {
      header = cells
    },
    onRow: (cells) => {
      rows.push(Object.fromEntries(header.map((name, index) => [name, cells[index] ?? ''])))
    },
  })
  return rows
}

describe('the CSV parsing layer on the csv-spectrum corpus', () => {
  it('has the corpus to test against', () => {
    expect(cases.length).toBeGreaterThanOrEqual(12)
  })

  it.each(cases.filter((name) => name !== 'location_coordinates'))('reads %s as the corpus expects', async (name) => {
    const expected = JSON.parse(readFileSync(path.join(corpus, 'json', `${name}.json`), 'utf8')) as Record<string, string>[]
    expect(await readAsObjects(path.join(corpus, 'csvs', `${name}.csv`))).toEqual(expected)
  })

  // The corpus's expected JSON for this file is one object, not a list, and its
  // phone number differs from the CSV's; every other field is compared.
  it("reads location_coordinates as the corpus expects, apart from the corpus's own phone-number slip", async () => {
    const expected = JSON.parse(readFileSync(path.join(corpus, 'json', 'location_coordinates.json'), 'utf8')) as Record<string, string>
    const [row, ...rest] = await readAsObjects(path.join(corpus, 'csvs', 'location_coordinates.csv'))
    expect(rest).toEqual([])
    expect(row!['Contact Phone Number']).toBe('2095257564')
    expect({ ...row, 'Contact Phone Number': expected['Contact Phone Number'] }).toEqual(expected)
  })
})
