import path from 'node:path'
import { z } from 'zod'
import type { CatalogueFiles } from './csv-files'
import type { Client } from './http'
import { failureReason } from './stats'

const committed = z.object({
  batchId: z.number(),
  counts: z.object({ created: z.number(), updated: z.number(), unchanged: z.number(), rejected: z.number() }),
})

export type ImportTiming = { rows: number; ms: number; failures: string[] }
export type LoadTimings = { parts: ImportTiming; links: ImportTiming; identities: ImportTiming }

/** One commit through the import API, as an editor uploads it; the rows it created. */
export async function commitImport(editor: Client, type: 'parts' | 'links', file: string): Promise<number> {
  const result = committed.parse(await editor.upload('/api/imports', { type, mode: 'commit' }, file))
  if (result.counts.rejected > 0) throw new Error(`${path.basename(file)}: ${result.counts.rejected} rows rejected`)
  return result.counts.created + result.counts.updated
}

async function importAll(editor: Client, type: 'parts' | 'links', files: string[]): Promise<ImportTiming> {
  const timing: ImportTiming = { rows: 0, ms: 0, failures: [] }
  for (const file of files) {
    const started = performance.now()
    try {
      const rows = await commitImport(editor, type, file)
      const ms = performance.now() - started
      timing.rows += rows
      timing.ms += ms
      console.log(`  imported ${path.basename(file)}: ${rows.toLocaleString('en')} rows in ${Math.round(ms).toLocaleString('en')} ms`)
    } catch (error) {
      timing.failures.push(`${path.basename(file)}: ${failureReason(error)}`)
      console.log(`  import of ${path.basename(file)} failed: ${failureReason(error)}`)
    }
  }
  return timing
}

/** Parts first (kind by kind), then the links in chunks, then the identities, all committed through the API. */
export async function loadCatalogue(editor: Client, files: CatalogueFiles): Promise<LoadTimings> {
  const parts = await importAll(editor, 'parts', files.parts)
  const links = await importAll(editor, 'links', files.links)
  const identities = await importAll(editor, 'links', [files.identities])
  return { parts, links, identities }
}
