import { createHash } from 'node:crypto'
import { createReadStream } from 'node:fs'
import type { ImportType } from '../../shared/schemas/imports'
import type { CsvReadSummary } from './csv/csv-stream'

type Entry<W> = { work: W; summary: CsvReadSummary; storedAt: number }

async function sha256(filePath: string): Promise<string> {
  const hash = createHash('sha256')
  for await (const chunk of createReadStream(filePath, { highWaterMark: 1 << 20 })) hash.update(chunk as Buffer)
  return hash.digest('hex')
}

/**
 * The checked rows of each editor's latest preview, so that committing the
 * same file right after does not read and check it again. The checked rows
 * depend only on the file's bytes, never on the catalogue, so reusing them is
 * exact; the plan against the catalogue is always made afresh at commit.
 */
export class PreviewCache<W> {
  private readonly entries = new Map<string, Entry<W>>()

  constructor(
    /** Rows held across all entries; past it the oldest preview is dropped. */
    private readonly maxRows = 1_000_000,
    private readonly ttlMs = 15 * 60_000,
  ) {}

  private key(userId: number | null, type: ImportType) {
    return `${userId ?? '-'}|${type}`
  }

  put(userId: number | null, type: ImportType, work: W, summary: CsvReadSummary) {
    const key = this.key(userId, type)
    this.entries.delete(key)
    if (summary.rows > this.maxRows) return
    let held = [...this.entries.values()].reduce((sum, entry) => sum + entry.summary.rows, 0)
    for (const [oldest, entry] of this.entries) {
      if (held + summary.rows <= this.maxRows) break
      this.entries.delete(oldest)
      held -= entry.summary.rows
    }
    this.entries.set(key, { work, summary, storedAt: Date.now() })
  }

  /** The cached preview of exactly this file (same size, same SHA-256), if there is one. */
  async match(userId: number | null, type: ImportType, filePath: string, fileSize: number): Promise<Entry<W> | undefined> {
    const key = this.key(userId, type)
    const entry = this.entries.get(key)
    if (!entry) return undefined
    if (Date.now() - entry.storedAt > this.ttlMs) {
      this.entries.delete(key)
      return undefined
    }
    if (entry.summary.bytes !== fileSize) return undefined
    return (await sha256(filePath)) === entry.summary.sha256 ? entry : undefined
  }

  drop(userId: number | null, type: ImportType) {
    this.entries.delete(this.key(userId, type))
  }
}
