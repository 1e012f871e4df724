import { mkdtempSync, rmSync } from 'node:fs'
import { tmpdir } from 'node:os'
import path from 'node:path'
import Database from 'better-sqlite3'
import { startAppUnderTest } from './scale/app-under-test'
import { BareQueries } from './scale/bare-queries'
import { inventCatalogue, type Catalogue } from './scale/catalogue'
import { measureConcurrentFits } from './scale/concurrency'
import { identityRows, linkRows, writeCatalogueFiles } from './scale/csv-files'
import { measureEdits } from './scale/edits'
import { signIn, type Client } from './scale/http'
import { measureReadsDuringCommit, measureSmallImports } from './scale/import-writes'
import { importLines, memoryLine } from './scale/load-lines'
import { loadCatalogue } from './scale/load'
import { scaleOptions } from './scale/options'
import { pickParts } from './scale/picks'
import { measureReads } from './scale/read-answers'
import { latencyLine, printTable, type Line } from './scale/report'
import { rawInsertRates } from './scale/raw-import'
import { failureReason, measure } from './scale/stats'
import { loadTypedGraph } from './scale/typed-graph'
import { measureServerMemory } from './scale/server-memory'
import type { Benchmark } from './types'

const IMPORT_CHUNK = 250_000
const SMALL_IMPORTS = 3
const megabytes = () => Math.round(process.memoryUsage().rss / 1024 / 1024)

/** The first answers after the load pay for building the fit graph; resident memory is read right after. */
async function firstAnswers(
  counter: Client,
  typical: string,
  far: string,
): Promise<{ lines: Line[]; rssBefore: number; rssAfter: number }> {
  const rssBefore = megabytes()
  const once = { requests: 1, warmup: 0, budgetMs: 0 }
  const fits = await measure(() => counter.get(`/api/parts/${encodeURIComponent(typical)}/fits`), once)
  const route = await measure(() => counter.get(`/api/graph/path?from=${encodeURIComponent(typical)}&to=${encodeURIComponent(far)}`), once)
  return {
    lines: [latencyLine('first what fits after the load', fits, null, {}), latencyLine('first path after the load', route, null, {})],
    rssBefore,
    rssAfter: megabytes(),
  }
}

/** The raw insert rates of the load's links and identity rows; a failure is reported, not thrown. */
function rawRates(dbPath: string, copyPath: string, catalogue: Catalogue): { links: number; identities: number } | string {
  try {
    const [links, identities] = rawInsertRates(dbPath, copyPath, [linkRows(catalogue.parts, catalogue.links), identityRows(catalogue)])
    return { links: links!, identities: identities! }
  } catch (error) {
    return failureReason(error)
  }
}

export const scaleBenchmark: Benchmark = {
  name: 'scale',
  description:
    'the goals table on an invented catalogue loaded through the import API, each answer beside a bare baseline (--links, --parts, --commit, --requests, --budget)',
  async run(args) {
    const options = scaleOptions(args)
    const dir = mkdtempSync(path.join(tmpdir(), 'fitwright-scale-'))
    try {
      let started = performance.now()
      const catalogue = inventCatalogue({
        parts: options.parts,
        links: options.links,
        extraLinks: options.commitRows + SMALL_IMPORTS * 100,
      })
      const files = writeCatalogueFiles(dir, catalogue, {
        chunk: IMPORT_CHUNK,
        commitRows: options.commitRows,
        smallImports: SMALL_IMPORTS,
      })
      console.log(
        `invented ${catalogue.parts.length.toLocaleString('en')} parts (${catalogue.families.length} families), ${catalogue.links.length.toLocaleString('en')} links and ${catalogue.identities.length.toLocaleString('en')} identities in ${Math.round(performance.now() - started)} ms`,
      )
      const app = await startAppUnderTest(dir, {
        FITWRIGHT_IMPORT_MAX_ROWS: '500000',
        FITWRIGHT_IMPORT_MAX_BYTES: String(512 * 1024 * 1024),
      })
      const db = new Database(app.dbPath, { readonly: true })
      let bare: BareQueries | undefined
      try {
        const counters = await Promise.all(Array.from({ length: 10 }, () => signIn(app.url, 'counter@fitwright.test', app.password)))
        const counter = counters[0]!
        const editor = await signIn(app.url, 'editor@fitwright.test', app.password)
        const importer = await signIn(app.url, 'editor@fitwright.test', app.password, 30 * 60_000)
        console.log('loading through POST /api/imports as the editor:')
        started = performance.now()
        const load = await loadCatalogue(importer, files)
        console.log(`  loaded in ${Math.round((performance.now() - started) / 1000)} s`)

        const graph = loadTypedGraph(db)
        const picks = pickParts(db, graph)
        console.log(
          `${picks.typical.length} typical parts with ${picks.typical[0]?.links}–${picks.typical.at(-1)?.links} links; hubs ${picks.hubs.map((h) => `${h.number} (${h.links} links)`).join(', ')}; paths of ${picks.paths.map((p) => p.steps).join(', ')} steps; build of ${Object.keys(picks.build).length} slots`,
        )
        const first = await firstAnswers(counter, picks.typical[0]!.number, picks.paths[0]!.to.number)
        bare = new BareQueries(db)
        console.log('measuring (sequential, warm):')
        const lines = [...first.lines, ...(await measureReads(counter, bare, graph, picks, options.pace))]
        lines.push(...(await measureConcurrentFits(counters, bare, picks.typical, options.pace)))
        lines.push(...(await measureEdits(editor, counter, bare, picks.typical)))
        lines.push(await measureSmallImports(importer, files.small))
        lines.push(
          ...(await measureReadsDuringCommit(importer, counter, bare, picks.typical, files.commit, options.commitRows, options.pace)),
        )
        lines.push(
          ...importLines(load, rawRates(app.dbPath, path.join(dir, 'raw.sqlite'), catalogue)),
          memoryLine(first.rssAfter, first.rssBefore),
          ...(await measureServerMemory(app.dbPath, app.password, {
            fits: `/api/parts/${encodeURIComponent(picks.typical[0]!.number)}/fits`,
            path: `/api/graph/path?from=${encodeURIComponent(picks.paths[0]!.from.number)}&to=${encodeURIComponent(picks.paths[0]!.to.number)}`,
          })),
        )
        console.log(
          `\n${catalogue.parts.length.toLocaleString('en')} parts, ${catalogue.links.length.toLocaleString('en')} links, ${catalogue.identities.length.toLocaleString('en')} identities; up to ${options.pace.requests} requests per answer or ${options.pace.budgetMs / 1000} s:`,
        )
        printTable(lines)
      } finally {
        bare?.close()
        db.close()
        await app.close()
      }
    } finally {
      rmSync(dir, { recursive: true, force: true })
    }
  },
}
