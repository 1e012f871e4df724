import session from 'express-session'
import type { SessionRepository } from './session.repository'

export type SessionLifetimes = {
  /** Ends a session nobody used for this long. */
  idleMs: number
  /** Ends a session this long after sign-in, however often it is used. */
  maxAgeMs: number
  /** The clock, injectable so tests can jump past a lifetime. */
  now?: () => number
}

type Done = (error?: unknown, value?: session.SessionData | null) => void

/**
 * A session's idle end moves on at most once a minute: every request of a signed-in
 * user would otherwise be a database write, and writes queue behind one another.
 */
const TOUCH_GRANULARITY_MS = 60_000
/** Sessions whose stored end this process remembers; past it the map starts afresh. */
const KNOWN_ENDS_HELD = 10_000

function userIdOf(data: session.SessionData): number | null {
  const user = (data as { passport?: { user?: unknown } }).passport?.user
  return typeof user === 'number' ? user : null
}

/** express-session's store on our data port, with a user id per row and an absolute end. */
export class DatabaseSessionStore extends session.Store {
  private readonly now: () => number
  private writes = 0
  /** The idle end last read or written per session id (ends only ever move later, so a stale one is safe). */
  private readonly knownEnds = new Map<string, number>()
  /** The latest expiry of each session whose touch is still being written. */
  private readonly touches = new Map<string, number>()

  constructor(
    private readonly sessions: SessionRepository,
    private readonly lifetimes: SessionLifetimes,
  ) {
    super()
    this.now = lifetimes.now ?? Date.now
  }

  private remember(sid: string, expiresAt: number) {
    if (this.knownEnds.size >= KNOWN_ENDS_HELD) this.knownEnds.clear()
    this.knownEnds.set(sid, expiresAt)
  }

  private settle(work: Promise<session.SessionData | null | void>, done?: Done) {
    work.then((value) => done?.(null, value ?? null)).catch((error: unknown) => done?.(error))
  }

  private async sweepNowAndThen(now: number) {
    // Ended rows are removed every hundred writes, so the table stays small without a timer.
    this.writes += 1
    if (this.writes % 100 === 0) await this.sessions.removeEnded(now, now - this.lifetimes.maxAgeMs)
  }

  override get(sid: string, done: Done): void {
    this.settle(
      (async () => {
        const row = await this.sessions.find(sid)
        const now = this.now()
        if (!row) return null
        if (row.expiresAt <= now || row.startedAt + this.lifetimes.maxAgeMs <= now) {
          await this.sessions.remove(sid)
          this.knownEnds.delete(sid)
          return null
        }
        this.remember(sid, row.expiresAt)
        return JSON.parse(row.data) as session.SessionData
      })(),
      done,
    )
  }

  override set(sid: string, data: session.SessionData, done?: (error?: unknown) => void): void {
    const now = this.now()
    this.remember(sid, now + this.lifetimes.idleMs)
    this.settle(
      (async () => {
        await this.sessions.save({
          id: sid,
          userId: userIdOf(data),
          data: JSON.stringify(data),
          expiresAt: now + this.lifetimes.idleMs,
          startedAt: now,
        })
        await this.sweepNowAndThen(now)
      })(),
      done,
    )
  }

  /**
   * Answers at once and writes the later expiry behind the answer: express-session
   * holds every signed-in response until touch is done, and while the import
   * worker holds the write lock a write waits for it. Touches of one session
   * waiting meanwhile collapse into the latest.
   */
  override touch(sid: string, _data: session.SessionData, done?: (error?: unknown) => void): void {
    const expiresAt = this.now() + this.lifetimes.idleMs
    const known = this.knownEnds.get(sid)
    if (known !== undefined && expiresAt - known < TOUCH_GRANULARITY_MS) {
      done?.()
      return
    }
    this.remember(sid, expiresAt)
    const waiting = this.touches.has(sid)
    this.touches.set(sid, expiresAt)
    done?.()
    if (!waiting) void this.writeTouches(sid)
  }

  private async writeTouches(sid: string) {
    try {
      for (let expiresAt = this.touches.get(sid); expiresAt !== undefined; expiresAt = this.touches.get(sid)) {
        await this.sessions.touch(sid, expiresAt)
        if (this.touches.get(sid) === expiresAt) this.touches.delete(sid)
      }
    } catch (error) {
      this.touches.delete(sid)
      this.knownEnds.delete(sid)
      console.error('Extending a session failed:', error)
    }
  }

  override destroy(sid: string, done?: (error?: unknown) => void): void {
    this.knownEnds.delete(sid)
    this.settle(this.sessions.remove(sid), done)
  }
}
