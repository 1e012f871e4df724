import { spawn, type ChildProcess } from 'node:child_process'
import { readFileSync } from 'node:fs'
import path from 'node:path'
import { signIn } from './http'
import { figureLine, failedLine, type Line } from './report'
import { failureReason } from './stats'

const GOAL = '≤ 500 MB'

/** Kilobytes of a /proc/<pid>/status field (Linux), as megabytes. */
function statusMb(pid: number, field: 'VmRSS' | 'VmHWM'): number {
  const status = readFileSync(`/proc/${pid}/status`, 'utf8')
  const kb = Number(new RegExp(`^${field}:\\s+(\\d+) kB`, 'm').exec(status)?.[1])
  if (!Number.isFinite(kb)) throw new Error(`no ${field} in /proc/${pid}/status`)
  return Math.round(kb / 1024)
}

function startServer(dbPath: string): Promise<{ child: ChildProcess; base: string }> {
  // Node itself with tsx's loader, so the pid read is the server's own.
  const child = spawn(process.execPath, ['--import', 'tsx', 'server/index.ts'], {
    env: {
      ...process.env,
      NODE_ENV: 'test',
      PORT: '0',
      HOST: '127.0.0.1',
      FITWRIGHT_DB_PATH: dbPath,
      FITWRIGHT_DEMO: '1',
      FITWRIGHT_UPLOAD_DIR: path.join(path.dirname(dbPath), 'photos'),
      FITWRIGHT_MAIL_DIR: path.join(path.dirname(dbPath), 'mail'),
    },
    stdio: ['ignore', 'pipe', 'inherit'],
  })
  return new Promise((resolve, reject) => {
    child.stdout!.on('data', (chunk: Buffer) => {
      const port = /localhost:(\d+)/.exec(chunk.toString())?.[1]
      if (port) resolve({ child, base: `http://127.0.0.1:${port}` })
    })
    child.on('exit', (code) => reject(new Error(`the server stopped before listening (exit ${code})`)))
  })
}

/**
 * Resident memory of the server alone. The in-process figure includes the
 * benchmark's own catalogue, baselines and clients; this one starts
 * server/index.ts as a child process on the loaded database, lets it build the
 * fit graph and answer a what-fits and a path as the counter, then reads the
 * child's resident set (VmRSS) and its peak (VmHWM) from /proc.
 */
export async function measureServerMemory(dbPath: string, password: string, asks: { fits: string; path: string }): Promise<Line[]> {
  let server: { child: ChildProcess; base: string } | undefined
  try {
    server = await startServer(dbPath)
    const counter = await signIn(server.base, 'counter@fitwright.test', password)
    await counter.get(asks.fits)
    await counter.get(asks.path)
    const pid = server.child.pid!
    const rss = statusMb(pid, 'VmRSS')
    const peak = statusMb(pid, 'VmHWM')
    return [
      figureLine(
        'resident memory, server process alone, graph built',
        `${rss.toLocaleString('en')} MB`,
        `peak ${peak.toLocaleString('en')} MB`,
        '',
        GOAL,
        rss <= 500,
      ),
    ]
  } catch (error) {
    return [failedLine('resident memory, server process alone', failureReason(error), GOAL)]
  } finally {
    if (server) {
      const exited = new Promise((resolve) => server!.child.once('exit', resolve))
      server.child.kill('SIGTERM')
      await exited
    }
  }
}
