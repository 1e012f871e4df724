import { afterEach, describe, expect, it } from 'vitest'
import { importStreamLineSchema, type ImportStreamLine } from '../../shared/schemas/imports'
import { WorkerRunner } from '../../server/imports/worker/import-runner'
import { uploadCsv } from '../helpers/imports'
import { createTestApp, type TestApp } from '../helpers/test-app'

let t: TestApp
afterEach(() => t.close())

const ROWS = 40_000
/** A large commit on a shared 2-core machine takes seconds; no timing is asserted. */
const SLOW = 120_000

/** A parts file large enough that its commit takes a while (every row is a new part). */
function largePartsFile(prefix: string, rows = ROWS): string {
  const lines = ['part_number,kind,name,notes']
  for (let i = 1; i <= rows; i++) lines.push(`${prefix}-${String(i).padStart(6, '0')},other,Spacer ${i},Made up for the worker test.`)
  return `${lines.join('\n')}\n`
}

async function editorOn() {
  // The import worker is for the embedded SQLite file; on PostgreSQL imports run through the data port.
  t = await createTestApp({ postgres: false, env: { FITWRIGHT_IMPORT_MAX_ROWS: String(ROWS + 10) } })
  return t.signIn('editor')
}

/** Commits a file asking for progress, handing every NDJSON line to `onLine` as it arrives (not when the answer ends). */
function streamedCommit(agent: Awaited<ReturnType<TestApp['signIn']>>, csv: string, onLine: (line: ImportStreamLine) => void) {
  return new Promise<void>((resolve, reject) => {
    uploadCsv(agent, csv, { type: 'parts', mode: 'commit', progress: true })
      .buffer(false)
      .parse((res, done) => {
        let rest = ''
        res.setEncoding('utf8')
        res.on('data', (chunk: string) => {
          rest += chunk
          for (let end = rest.indexOf('\n'); end >= 0; end = rest.indexOf('\n')) {
            onLine(importStreamLineSchema.parse(JSON.parse(rest.slice(0, end))))
            rest = rest.slice(end + 1)
          }
        })
        res.on('end', () => {
          done(null, null)
          // Only now has every line been seen (superagent may settle its own promise before the body ends).
          resolve()
        })
      })
      .then(undefined, reject)
  })
}

const count = async (table: string) => ((await t.dataSource.query(`SELECT COUNT(*) AS n FROM "${table}"`)) as { n: number }[])[0]!.n

describe('imports in the import worker', () => {
  it(
    'answers a signed-in /api/health while a large commit is being written, before the write ends',
    async () => {
      const editor = await editorOn()
      // Signed in, so the answer also waits for its session's touch (a write) as every signed-in answer does.
      const counter = await t.signIn('counter')
      const events: string[] = []
      let health: Promise<void> | undefined
      await streamedCommit(editor, largePartsFile('TW-HL'), (line) => {
        if (line.type === 'progress' && line.phase === 'write') {
          // Records still to write: the transaction is open.
          if (line.done < line.total) events.push('writing')
          health ??= counter.get('/api/health').then((response) => {
            expect(response.status).toBe(200)
            events.push('health answered')
          })
        }
        if (line.type === 'result') events.push(`result ${line.status}`)
      })
      await health
      const answered = events.indexOf('health answered')
      expect(answered).toBeGreaterThan(0)
      // On the event loop, the whole write would be reported before health could answer.
      expect(events.slice(answered + 1)).toContain('writing')
      expect(events.at(-1)).toBe('result 201')
    },
    SLOW,
  )

  it(
    'reports the write phase as records written of the records to write, ending at all of them',
    async () => {
      const editor = await editorOn()
      const lines: ImportStreamLine[] = []
      await streamedCommit(editor, largePartsFile('TW-PR'), (line) => lines.push(line))
      const writes = lines.flatMap((line) => (line.type === 'progress' && line.phase === 'write' ? [line] : []))
      expect(writes.length).toBeGreaterThanOrEqual(3)
      expect(new Set(writes.map((line) => line.total))).toEqual(new Set([ROWS]))
      expect(writes[0]!.done).toBe(0)
      expect(writes.at(-1)!.done).toBe(ROWS)
      expect(writes.some((line) => line.done > 0 && line.done < ROWS)).toBe(true)
      const done = writes.map((line) => line.done)
      expect(done).toEqual([...done].sort((a, b) => a - b))
      expect(lines.at(-1)).toMatchObject({ type: 'result', status: 201, body: { counts: { created: ROWS } } })
    },
    SLOW,
  )

  it(
    'fails the job with a 500 when the worker dies mid-write, leaves nothing written, and takes the next import',
    async () => {
      const editor = await editorOn()
      const before = { parts: await count('part'), marks: await count('part_mark'), batches: await count('import_batch') }
      const runner = t.services.imports.jobRunner
      if (!(runner instanceof WorkerRunner)) throw new Error('This app imports without a worker.')
      let killed = false
      let last: ImportStreamLine | undefined
      await streamedCommit(editor, largePartsFile('TW-KL'), (line) => {
        last = line
        if (line.type === 'progress' && line.phase === 'write' && line.done > 0 && !killed) {
          killed = true
          void runner.worker.terminate()
        }
      })
      expect(killed).toBe(true)
      expect(last).toMatchObject({ type: 'error', status: 500, body: { error: { code: 'import_failed' } } })
      expect({ parts: await count('part'), marks: await count('part_mark'), batches: await count('import_batch') }).toEqual(before)

      const next = await uploadCsv(editor, 'part_number,kind,name\nTW-NX-000001,other,Spacer after\n', { type: 'parts', mode: 'commit' })
      expect(next.status, JSON.stringify(next.body)).toBe(201)
      expect((await editor.get('/api/parts/TW-NX-000001')).status).toBe(200)
      expect(await count('part')).toBe(before.parts + 1)
    },
    SLOW,
  )
})
