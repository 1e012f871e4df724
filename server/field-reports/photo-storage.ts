import { randomUUID } from 'node:crypto'
import { mkdir, readdir, readFile, rename, rm, stat, writeFile } from 'node:fs/promises'
import path from 'node:path'

const KEY = /^[a-z0-9-]+\.(jpg|webp)$/
const TEMP_PREFIX = '.incoming-'

/**
 * Where photos live: files in one folder by default. Everything else names a
 * photo by its key only, so an object store can take this module's place.
 */
export class PhotoStorage {
  constructor(private readonly dir: string) {}

  /** Writes under a temporary name and renames, so a crash never leaves half a photo under a real key. */
  async put(bytes: Buffer, extension: 'jpg' | 'webp'): Promise<string> {
    await mkdir(this.dir, { recursive: true })
    const key = `${randomUUID()}.${extension}`
    const temporary = path.join(this.dir, `${TEMP_PREFIX}${key}`)
    await writeFile(temporary, bytes)
    await rename(temporary, path.join(this.dir, key))
    return key
  }

  async get(key: string): Promise<Buffer> {
    return readFile(this.pathOf(key))
  }

  async remove(keys: string[]): Promise<void> {
    await Promise.all(keys.map((key) => rm(this.pathOf(key), { force: true })))
  }

  /** Start-up: temporary files older than a minute are left from a crash mid-write. */
  async removeStaleTemporaries(olderThanMs = 60_000): Promise<number> {
    let names: string[]
    try {
      names = await readdir(this.dir)
    } catch {
      return 0
    }
    let removed = 0
    for (const name of names.filter((n) => n.startsWith(TEMP_PREFIX))) {
      const file = path.join(this.dir, name)
      const info = await stat(file).catch(() => null)
      if (info && Date.now() - info.mtimeMs > olderThanMs) {
        await rm(file, { force: true })
        removed++
      }
    }
    return removed
  }

  private pathOf(key: string): string {
    if (!KEY.test(key)) throw new Error(`Not a photo key: ${key}`)
    return path.join(this.dir, key)
  }
}
