import { mkdtempSync, rmSync, statSync, writeFileSync } from 'node:fs'
import { tmpdir } from 'node:os'
import path from 'node:path'
import Papa from 'papaparse'
import { prepareDatabase } from '../server/bootstrap'
import { loadConfig } from '../server/config/env'
import { sqliteConnection } from '../server/db/sqlite-connection'
import { FitGraphIndex } from '../server/fitment/fit-graph'
import { ImportService, type ImportRun } from '../server/imports/import.service'
import { rawInsert, type LinkRow } from './raw-insert'
import type { Benchmark } from './types'

const LINK_ROWS = 100_000
const PART_COUNT = 1_000
const ROUNDS = 3
const MODIFICATION = 'oil-restrictor-fit'

/** Distinct unordered pairs spread over the parts, a tenth with a modification. */
function linkRows(): LinkRow[] {
  const rows: LinkRow[] = []
  const number = (i: number) => `BN-${String(i).padStart(5, '0')}`
  for (let i = 0; i < PART_COUNT && rows.length < LINK_ROWS; i++) {
    for (let j = i + 1; j < PART_COUNT && rows.length < LINK_ROWS; j += 4) {
      const k = rows.length % 10
      const relation = k === 0 ? 'fits-with-modification' : k === 1 ? 'does-not-fit' : 'fits'
      rows.push([number(i), number(j), relation, k === 0 ? MODIFICATION : '', `Bench pair ${rows.length}`, 'import'])
    }
  }
  return rows
}

/** A fresh database with the shipped modifications and the bench parts, as the importer would find it. */
async function freshDatabase(dir: string, name: string) {
  const config = loadConfig({ NODE_ENV: 'test', FITWRIGHT_DEMO: '0', FITWRIGHT_DB_PATH: path.join(dir, `${name}.sqlite`) })
  const { dataSource } = await prepareDatabase(config)
  const db = sqliteConnection(dataSource)
  const insert = db.prepare(
    "INSERT INTO part (partNumber, partKey, kind, name, family, notes, attributes) VALUES (?, ?, 'other', ?, 'Bench', '', '{}')",
  )
  db.transaction(() => {
    for (let i = 0; i < PART_COUNT; i++) {
      const partNumber = `BN-${String(i).padStart(5, '0')}`
      insert.run(partNumber, partNumber.replace('-', ''), `Bench part ${i}`)
    }
  })()
  return dataSource
}

const median = (values: number[]) => [...values].sort((a, b) => a - b)[Math.floor(values.length / 2)]!
const rate = (ms: number) => Math.round(LINK_ROWS / (ms / 1000))

export const importLinksBenchmark: Benchmark = {
  name: 'import-links',
  description: `${LINK_ROWS.toLocaleString('en')} link rows: preview plus commit through the import service, against a raw better-sqlite3 insert`,
  async run() {
    const dir = mkdtempSync(path.join(tmpdir(), 'fitwright-bench-'))
    try {
      const rows = linkRows()
      const file = path.join(dir, 'links.csv')
      writeFileSync(file, Papa.unparse([['from_part', 'to_part', 'relation', 'modifications', 'note', 'source'], ...rows]))
      const times = { raw: [] as number[], preview: [] as number[], commit: [] as number[], cold: [] as number[] }
      for (let round = 1; round <= ROUNDS; round++) {
        const rawSource = await freshDatabase(dir, `raw-${round}`)
        times.raw.push(rawInsert(sqliteConnection(rawSource), rows))
        await rawSource.destroy()

        const dataSource = await freshDatabase(dir, `import-${round}`)
        const imports = new ImportService(dataSource, { maxRows: 500_000 }, new FitGraphIndex(dataSource))
        const run: Omit<ImportRun, 'mode'> = {
          filePath: file,
          fileName: 'links.csv',
          fileSize: statSync(file).size,
          type: 'links',
          validRowsOnly: false,
          user: { id: null, name: 'bench' },
        }
        let started = performance.now()
        const preview = await imports.run({ ...run, mode: 'preview' })
        times.preview.push(performance.now() - started)
        started = performance.now()
        const commit = await imports.run({ ...run, mode: 'commit' })
        times.commit.push(performance.now() - started)
        const [{ links }] = (await dataSource.query('SELECT COUNT(*) AS links FROM link')) as [{ links: number }]
        if (preview.counts.created !== LINK_ROWS || commit.counts.created !== LINK_ROWS || links !== LINK_ROWS) {
          throw new Error(
            `Round ${round} did not import every row: ${JSON.stringify({ preview: preview.counts, commit: commit.counts, links })}`,
          )
        }
        await dataSource.destroy()

        const coldSource = await freshDatabase(dir, `cold-${round}`)
        const cold = new ImportService(coldSource, { maxRows: 500_000 }, new FitGraphIndex(coldSource))
        started = performance.now()
        await cold.run({ ...run, mode: 'commit' })
        times.cold.push(performance.now() - started)
        await coldSource.destroy()
      }
      const raw = median(times.raw)
      const preview = median(times.preview)
      const commit = median(times.commit)
      const cold = median(times.cold)
      const ratio = rate(preview + commit) / rate(raw)
      console.log(`median of ${ROUNDS} rounds, same run, same rows, fresh database each time:`)
      console.log(`  raw prepared insert, one transaction : ${rate(raw).toLocaleString('en').padStart(9)} rows/s  (${raw.toFixed(0)} ms)`)
      console.log(
        `  import preview                       : ${rate(preview).toLocaleString('en').padStart(9)} rows/s  (${preview.toFixed(0)} ms)`,
      )
      console.log(
        `  import commit after that preview     : ${rate(commit).toLocaleString('en').padStart(9)} rows/s  (${commit.toFixed(0)} ms; reuses the preview's checked rows)`,
      )
      console.log(
        `  import preview + commit              : ${rate(preview + commit)
          .toLocaleString('en')
          .padStart(9)} rows/s  (${(preview + commit).toFixed(0)} ms)`,
      )
      console.log(
        `  ratio (preview + commit) / raw       : ${ratio.toFixed(2)}  (goal: at least 0.33, ${ratio >= 1 / 3 ? 'met' : 'NOT met'})`,
      )
      console.log(
        `  import commit without a preview      : ${rate(cold).toLocaleString('en').padStart(9)} rows/s  (${cold.toFixed(0)} ms; reads and checks the file itself)`,
      )
      console.log(`  ratio commit without a preview / raw : ${(rate(cold) / rate(raw)).toFixed(2)}`)
    } finally {
      rmSync(dir, { recursive: true, force: true })
    }
  },
}
