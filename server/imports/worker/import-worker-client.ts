import { createRequire } from 'node:module'
import path from 'node:path'
import { pathToFileURL } from 'node:url'
import { Worker } from 'node:worker_threads'
import { AppError } from '../../errors/app-error'
import { receivedError, type JobReply, type JobRequest, type JobWork } from './worker-messages'

type Job = JobWork & { dbPath: string }
type Progress = (reply: Extract<JobReply, { type: 'progress' }>) => void
type Running = { id: number; resolve: (value: unknown) => void; reject: (error: Error) => void; onProgress?: Progress }

/** How long the worker waits for the main thread's write lock before a job fails. */
const BUSY_TIMEOUT_MS = 60_000

/**
 * Node 20 does not carry tsx's loader into a worker (nor honour `--import`
 * there), so a worker started from TypeScript source (tsx, vitest) first
 * registers tsx's hooks, then imports the entry.
 */
const FROM_SOURCE = `
const { workerData } = require('node:worker_threads')
import(workerData.tsxApi).then(({ register }) => { register(); return import(workerData.entry) })
`

function spawnWorker(workerData: Record<string, unknown>): Worker {
  if (!import.meta.url.endsWith('.ts')) return new Worker(new URL('./import-worker.js', import.meta.url), { workerData })
  const tsxRoot = path.dirname(createRequire(import.meta.url).resolve('tsx/package.json'))
  return new Worker(FROM_SOURCE, {
    eval: true,
    workerData: {
      ...workerData,
      tsxApi: pathToFileURL(path.join(tsxRoot, 'dist/esm/api/index.mjs')).href,
      entry: new URL('./import-worker.ts', import.meta.url).href,
    },
  })
}

/**
 * The one import worker thread of this process, shared by every app in it
 * (tests build many): started at the first job, jobs run one after another,
 * progress passed on as it comes. A worker that dies fails its job with a 500
 * (its open transaction is rolled back with its connection) and a fresh one
 * is started.
 */
class WorkerThread {
  private worker?: Worker
  private running?: Running
  private line: Promise<unknown> = Promise.resolve()
  private nextId = 1

  private start(): Worker {
    const worker = spawnWorker({ busyTimeoutMs: BUSY_TIMEOUT_MS })
    worker.unref()
    worker.on('message', (reply: JobReply) => this.receive(reply))
    worker.on('error', (error) => console.error('Import worker failed:', error))
    worker.on('exit', () => {
      if (this.worker === worker) this.worker = undefined
      const running = this.running
      this.running = undefined
      running?.reject(new AppError(500, 'import_failed', 'The import stopped unexpectedly; nothing was written. Try again.'))
      if (running) this.worker = this.start()
    })
    return worker
  }

  private receive(reply: JobReply) {
    const running = this.running
    if (!running || running.id !== reply.id) return
    if (reply.type === 'progress') return running.onProgress?.(reply)
    this.running = undefined
    this.worker?.unref()
    if (reply.type === 'done') running.resolve(reply.value)
    else running.reject(receivedError(reply.error))
  }

  private send(job: Job, onProgress?: Progress): Promise<unknown> {
    const worker = (this.worker ??= this.start())
    const id = this.nextId++
    return new Promise((resolve, reject) => {
      this.running = { id, resolve, reject, onProgress }
      // Held while a job runs, so a tool that only awaits its import is not ended under it.
      worker.ref()
      worker.postMessage({ ...job, id } as JobRequest)
    })
  }

  /** Runs a job after the ones already waiting. */
  run(job: Job, onProgress?: Progress): Promise<unknown> {
    const result = this.line.then(() => this.send(job, onProgress))
    this.line = result.catch(() => undefined)
    return result
  }

  /** Ends the thread at once, as a crash would. */
  async terminate(): Promise<void> {
    await this.worker?.terminate()
  }
}

const thread = new WorkerThread()

/** One database's jobs in the import worker. */
export class ImportWorker {
  private closed = false

  constructor(private readonly dbPath: string) {}

  run(job: JobWork, onProgress?: Progress): Promise<unknown> {
    if (this.closed) return Promise.reject(new AppError(503, 'shutting_down', 'The server is shutting down; try the import again later.'))
    return thread.run({ ...job, dbPath: this.dbPath }, onProgress)
  }

  /** Ends the worker thread at once, as a crash would: its job fails and a fresh worker takes the next. */
  terminate(): Promise<void> {
    return thread.terminate()
  }

  /** Closes this database's connection in the worker, after the jobs already waiting (shutdown). */
  async close(): Promise<void> {
    if (this.closed) return
    this.closed = true
    await thread.run({ kind: 'close', dbPath: this.dbPath }).catch(() => undefined)
  }
}
