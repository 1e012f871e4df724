import { parentPort, workerData } from 'node:worker_threads'
import Database from 'better-sqlite3'
import { revertBatch } from '../../audit/revert'
import { SqliteDatabase } from '../../db/sqlite-database'
import { exportCsv } from '../export.service'
import { ImportJobs } from '../import-job'
import { sendableError, type JobReply, type JobRequest } from './worker-messages'

/**
 * The import worker: its own connection on each SQLite file it is asked about
 * (WAL, so the main thread's readers go on while it writes), where imports and
 * reverts read, check, plan and write. Jobs come one at a time from the main
 * thread.
 */
const { busyTimeoutMs } = workerData as { busyTimeoutMs: number }
const port = parentPort!
const open = new Map<string, { handle: Database.Database; db: SqliteDatabase; jobs: ImportJobs }>()

function connection(dbPath: string) {
  let entry = open.get(dbPath)
  if (!entry) {
    const handle = new Database(dbPath, { fileMustExist: true })
    handle.pragma('journal_mode = WAL')
    handle.pragma('synchronous = NORMAL')
    // The same as the main connection (TypeORM turns it on), so deletes cascade alike.
    handle.pragma('foreign_keys = ON')
    // The port waits for the main thread's write lock by retrying, which blocks only this thread anyway.
    const db = new SqliteDatabase(handle, busyTimeoutMs)
    open.set(dbPath, (entry = { handle, db, jobs: new ImportJobs(db) }))
  }
  return entry
}

const send = (reply: JobReply) => port.postMessage(reply)

async function perform(request: JobRequest): Promise<unknown> {
  if (request.kind === 'close') {
    open.get(request.dbPath)?.handle.close()
    open.delete(request.dbPath)
    return null
  }
  const { db, jobs } = connection(request.dbPath)
  if (request.kind === 'revert') return db.transaction((tx) => revertBatch(tx, request.batchId, request.userName))
  // One read transaction, so the file is one moment of the catalogue even while the main thread writes.
  if (request.kind === 'export') return db.snapshot((tx) => exportCsv(tx, request.file))
  return jobs.run(request.input, request.maxRows, (phase, done, total) => send({ id: request.id, type: 'progress', phase, done, total }))
}

port.on('message', (request: JobRequest) => {
  perform(request).then(
    (value) => send({ id: request.id, type: 'done', value }),
    (error: unknown) => send({ id: request.id, type: 'failed', error: sendableError(error) }),
  )
})
