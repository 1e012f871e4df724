/**
 * Crash safety of imports: starts the server as a child, commits a large parts
 * import, kills the child with SIGKILL part-way, and checks that the database
 * passes PRAGMA integrity_check and holds the parts wholly from before or
 * wholly from after the import. Run: `npx tsx bench/crash-safety.ts [--rounds 5]`.
 * A check script, not a test: it takes a minute or two and needs the machine to itself.
 *
 * The write runs as one synchronous transaction, so the server says nothing
 * while it runs; from outside it shows as the write-ahead log growing (the
 * transaction's pages spill there before the commit). A first, uncut import
 * measures how far the log grows before its commit shows to another reader; each round then kills
 * the server once the log has grown by a larger share of that, so the kills
 * land across the open transaction. A round whose parts are wholly from before
 * although the log had grown was killed inside the transaction.
 */
import { spawn, type ChildProcess } from 'node:child_process'
import { existsSync, mkdtempSync, readdirSync, rmSync, statSync } from 'node:fs'
import { tmpdir } from 'node:os'
import path from 'node:path'
import Database from 'better-sqlite3'
import { DEMO_PASSWORD } from '../server/demo/seed'

const ROWS = 200_000
const args = process.argv.slice(2)
const rounds = Number(args[args.indexOf('--rounds') + 1] ?? 0) || 8

function partsCsv(round: number): string {
  const lines = ['part_number,kind,name']
  for (let i = 0; i < ROWS; i += 1) lines.push(`TM-CR${round}-${i},other,Crash test spacer ${i}`)
  return `${lines.join('\n')}\n`
}

function startServer(dbPath: string): Promise<{ child: ChildProcess; base: string }> {
  // Node itself with tsx's loader, not the tsx wrapper: a kill must reach the server, not a parent that leaves it running.
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
    child.on('exit', (code) => reject(new Error(`The server stopped before listening (exit ${code}).`)))
  })
}

type Session = { cookie: string; token: string }

/** A session and its CSRF token, as a script gets them (README, API section). */
async function csrf(base: string, cookie = ''): Promise<Session> {
  const response = await fetch(`${base}/api/auth/csrf`, { headers: cookie ? { cookie } : {} })
  const sid =
    response.headers
      .getSetCookie()
      .find((c) => c.startsWith('fitwright.sid='))
      ?.split(';')[0] ?? cookie
  return { cookie: sid, token: ((await response.json()) as { token: string }).token }
}

async function signIn(base: string): Promise<Session> {
  const anonymous = await csrf(base)
  const response = await fetch(`${base}/api/auth/login`, {
    method: 'POST',
    headers: { 'content-type': 'application/json', origin: base, cookie: anonymous.cookie, 'x-csrf-token': anonymous.token },
    body: JSON.stringify({ email: 'editor@fitwright.test', password: DEMO_PASSWORD }),
  })
  if (!response.ok) throw new Error(`Sign-in failed: ${response.status}`)
  const cookie = response.headers
    .getSetCookie()
    .find((c) => c.startsWith('fitwright.sid='))!
    .split(';')[0]!
  return csrf(base, cookie)
}

function check(dbPath: string, before: number, round: number): string {
  const db = new Database(dbPath)
  try {
    const integrity = db.pragma('integrity_check', { simple: true })
    const parts = (db.prepare('SELECT count(*) AS n FROM part').get() as { n: number }).n
    const imported = (db.prepare('SELECT count(*) AS n FROM part WHERE "partNumber" LIKE ?').get(`TM-CR${round}-%`) as { n: number }).n
    const whole = (parts === before && imported === 0) || (parts === before + ROWS && imported === ROWS)
    if (integrity !== 'ok' || !whole)
      throw new Error(`Round ${round}: integrity ${integrity}, ${parts} parts (before ${before}, imported ${imported}).`)
    return imported === 0 ? 'before' : 'after'
  } finally {
    db.close()
  }
}

/**
 * Empties the write-ahead log while the server idles, so the next write appends
 * from its start: a log file left long by an earlier write is reused in place
 * and would not grow until the new write passed its old length.
 */
async function truncateLog(dbPath: string) {
  const db = new Database(dbPath)
  try {
    // Busy while the server's own beat holds a read: try again shortly.
    for (let attempt = 0; attempt < 200; attempt++) {
      const [result] = db.pragma('wal_checkpoint(TRUNCATE)') as { busy: number }[]
      if (result?.busy === 0 && walSize(dbPath) === 0) return
      await new Promise((resolve) => setTimeout(resolve, 10))
    }
    throw new Error(`The write-ahead log could not be emptied (${walSize(dbPath)} bytes left).`)
  } finally {
    db.close()
  }
}

function walSize(dbPath: string): number {
  const wal = `${dbPath}-wal`
  return existsSync(wal) ? statSync(wal).size : 0
}

function countParts(dbPath: string): number {
  const db = new Database(dbPath, { readonly: true })
  try {
    return (db.prepare('SELECT count(*) AS n FROM part').get() as { n: number }).n
  } finally {
    db.close()
  }
}

/** Starts a commit of `round`'s file and reads the answer's lines until the write phase begins (or the answer comes). */
async function startImport(base: string, session: Session, round: number) {
  const form = new FormData()
  form.set('type', 'parts')
  form.set('mode', 'commit')
  form.set('file', new Blob([partsCsv(round)], { type: 'text/csv' }), 'crash.csv')
  const response = await fetch(`${base}/api/imports`, {
    method: 'POST',
    headers: { cookie: session.cookie, origin: base, 'x-csrf-token': session.token, accept: 'application/x-ndjson' },
    body: form,
  })
  const reader = response.body!.getReader()
  const decoder = new TextDecoder()
  let seen = ''
  const answered = () => /"type":"result"/.test(seen)
  for (;;) {
    const { done, value } = await reader.read()
    if (done) break
    seen += decoder.decode(value, { stream: true })
    if (/"phase":"write"/.test(seen) || answered()) break
  }
  /** Reads on until the answer (for the uncut import). */
  const finish = async () => {
    for (;;) {
      if (answered()) return true
      const { done, value } = await reader.read()
      if (done) return answered()
      seen += decoder.decode(value, { stream: true })
    }
  }
  return { reader, answered, finish }
}

/** Polls the log's size every millisecond until it has grown by `bytes` past `from`, or `give up` ms pass. */
async function logGrown(dbPath: string, from: number, bytes: number, giveUpMs: number): Promise<number> {
  const started = Date.now()
  for (;;) {
    const grown = walSize(dbPath) - from
    if (grown >= bytes || Date.now() - started > giveUpMs) return grown
    await new Promise((resolve) => setTimeout(resolve, 1))
  }
}

const dir = mkdtempSync(path.join(tmpdir(), 'fitwright-crash-'))
const dbPath = path.join(dir, 'crash.sqlite')
try {
  // Round 0, uncut: how far the log grows before the import's commit becomes visible to another reader.
  let fullGrowth = 0
  {
    const { child, base } = await startServer(dbPath)
    const session = await signIn(base)
    await truncateLog(dbPath)
    const walBefore = walSize(dbPath)
    const started = Date.now()
    const probe = new Database(dbPath)
    const lastRow = probe.prepare('SELECT 1 FROM part WHERE "partNumber" = ?').pluck()
    let committed = false
    let committedAfterMs = 0
    const watching = setInterval(() => {
      if (committed) return
      if (lastRow.get(`TM-CR0-${ROWS - 1}`)) {
        committed = true
        committedAfterMs = Date.now() - started
      } else fullGrowth = walSize(dbPath) - walBefore
    }, 1)
    const run = await startImport(base, session, 0)
    const ok = await run.finish()
    clearInterval(watching)
    probe.close()
    child.kill('SIGKILL')
    await new Promise((resolve) => child.once('exit', resolve))
    if (!ok || !committed) throw new Error('The uncut import gave no answer or never committed.')
    console.log(
      `uncut import: ${ROWS.toLocaleString('en')} parts committed after ${committedAfterMs} ms, answered after ${Date.now() - started} ms; the log grew by ${(fullGrowth / 1024).toFixed(0)} KB before the commit showed`,
    )
  }
  let inside = 0
  for (let round = 1; round <= rounds; round += 1) {
    const { child, base } = await startServer(dbPath)
    const session = await signIn(base).catch((error: unknown) => {
      child.kill('SIGKILL')
      throw error
    })
    const before = countParts(dbPath)
    await truncateLog(dbPath)
    const walBefore = walSize(dbPath)
    // The log is watched from the moment the file is sent: the server's own lines leave only between turns of
    // its event loop, so the one saying the write has begun may arrive after the write is done.
    const running = startImport(base, session, round)
    running.catch(() => undefined)
    // Spread across the write: round r waits for r / (rounds + 1) of the uncut import's growth.
    const target = Math.max(1, Math.floor((fullGrowth * round) / (rounds + 1)))
    const grown = await logGrown(dbPath, walBefore, target, 120_000)
    const exited = new Promise((resolve) => child.once('exit', resolve))
    child.kill('SIGKILL')
    await exited
    const run = await running.catch(() => null)
    const answeredBeforeKill = run?.answered() ?? false
    await run?.reader.cancel().catch(() => undefined)
    const state = check(dbPath, before, round)
    const wasInside = state === 'before' && grown > 0
    if (wasInside) inside++
    const leftovers = readdirSync(path.join(dir, 'uploads-in-progress')).length
    console.log(
      `round ${round}: killed once the log had grown by ${(grown / 1024).toFixed(0)} KB of the ${(fullGrowth / 1024).toFixed(0)} KB the uncut write added before its commit` +
        `${answeredBeforeKill ? ' (the commit had answered)' : ''}; integrity ok, parts wholly ${state}` +
        `${wasInside ? ' (killed inside the open write transaction: rolled back)' : ''}; ${leftovers} upload file(s) left until the next start`,
    )
  }
  console.log(`${inside} of ${rounds} kills landed inside the open write transaction; every round left the database whole`)
  const { child } = await startServer(dbPath)
  const leftovers = readdirSync(path.join(dir, 'uploads-in-progress')).length
  child.kill('SIGKILL')
  console.log(`after a restart: ${leftovers} upload file(s) left`)
  if (leftovers) process.exitCode = 1
} finally {
  rmSync(dir, { recursive: true, force: true })
}
