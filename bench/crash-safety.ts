/**
 * Crash safety of imports: starts the server as a child, commits a large parts
 * import, kills the child with SIGKILL part-way, and checks that the database
 * passes PRAGMA integrity_check and holds the parts wholly from before or
 * wholly from after the import. Run: `npx tsx bench/crash-safety.ts [--rounds 5]`.
 * A check script, not a test: it takes a minute and needs the machine to itself.
 */
import { spawn, type ChildProcess } from 'node:child_process'
import { mkdtempSync, readdirSync, rmSync } from 'node:fs'
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
  const child = spawn('node_modules/.bin/tsx', ['server/index.ts'], {
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

const dir = mkdtempSync(path.join(tmpdir(), 'fitwright-crash-'))
const dbPath = path.join(dir, 'crash.sqlite')
try {
  for (let round = 1; round <= rounds; round += 1) {
    const { child, base } = await startServer(dbPath)
    const session = await signIn(base).catch((error: unknown) => {
      child.kill('SIGKILL')
      throw error
    })
    const before = (() => {
      const db = new Database(dbPath, { readonly: true })
      const n = (db.prepare('SELECT count(*) AS n FROM part').get() as { n: number }).n
      db.close()
      return n
    })()
    const form = new FormData()
    form.set('type', 'parts')
    form.set('mode', 'commit')
    form.set('file', new Blob([partsCsv(round)], { type: 'text/csv' }), 'crash.csv')
    // The answer streams its phases. The write runs as one synchronous transaction, so its own progress line
    // only leaves after the commit: the kill is timed from the first line instead, later each round, so the
    // rounds fall across reading, checking and writing.
    const killAfterMs = (round - 1) * 150
    const response = await fetch(`${base}/api/imports`, {
      method: 'POST',
      headers: { cookie: session.cookie, origin: base, 'x-csrf-token': session.token, accept: 'application/x-ndjson' },
      body: form,
    })
    const reader = response.body!.getReader()
    let seen = ''
    let answer: { status: number } | null = null
    for (;;) {
      const { done, value } = await reader.read()
      if (done) break
      seen += new TextDecoder().decode(value)
      if (/"type":"result"/.test(seen)) answer = { status: 201 }
      if (/"type":"progress"/.test(seen) || answer) break
    }
    await new Promise((resolve) => setTimeout(resolve, killAfterMs))
    const exited = new Promise((resolve) => child.once('exit', resolve))
    child.kill('SIGKILL')
    await exited
    await reader.cancel().catch(() => undefined)
    const state = check(dbPath, before, round)
    const leftovers = readdirSync(path.join(dir, 'uploads-in-progress')).length
    console.log(
      `round ${round}: killed ${killAfterMs} ms after the first progress line (${answer ? 'after the commit answered' : 'before any answer'}); integrity ok, parts wholly ${state}; ${leftovers} upload file(s) left until the next start`,
    )
  }
  const { child } = await startServer(dbPath)
  const leftovers = readdirSync(path.join(dir, 'uploads-in-progress')).length
  child.kill('SIGKILL')
  console.log(`after a restart: ${leftovers} upload file(s) left`)
  if (leftovers) process.exitCode = 1
} finally {
  rmSync(dir, { recursive: true, force: true })
}
