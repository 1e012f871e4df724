import { parentPort, workerData } from 'node:worker_threads'
import Database from 'better-sqlite3'
import { revertBatch } from '../../audit/revert'
import { ImportJobs } from '../import-job'
import { sendableError, type JobReply, type JobRequest } from './worker-messages'

/**
 * The import worker: its own connection on the server's SQLite file (WAL, so
 * the main thread's readers go on while it writes), where imports and reverts
 * read, check, plan and write. Jobs come one at a time from the main thread.
 */
const { dbPath, busyTimeoutMs } = workerData as { dbPath: string; busyTimeoutMs: number }
const port = parentPort!
const db = new Database(dbPath)
db.pragma('journal_mode = WAL')
db.pragma('synchronous = NORMAL')
// The same as the main connection (TypeORM turns it on), so deletes cascade alike.
db.pragma('foreign_keys = ON')
// Waiting here for the main thread's write blocks only this thread.
db.pragma(`busy_timeout = ${busyTimeoutMs}`)

const jobs = new ImportJobs(
  () => db,
  async (work) => db.transaction(() => work(db)).immediate(),
)

const send = (reply: JobReply) => port.postMessage(reply)

async function perform(request: JobRequest): Promise<unknown> {
  if (request.kind === 'revert') return db.transaction(() => revertBatch(db, request.batchId, request.userName)).immediate()
  return jobs.run(request.input, request.maxRows, (phase, done, total) => send({ id: request.id, type: 'progress', phase, done, total }))
}

port.on('message', (request: JobRequest) => {
  perform(request).then(
    (value) => send({ id: request.id, type: 'done', value }),
    (error: unknown) => send({ id: request.id, type: 'failed', error: sendableError(error) }),
  )
})

port.on('close', () => db.close())
