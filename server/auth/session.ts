import { randomBytes } from 'node:crypto'
import session from 'express-session'
import type { DataSource } from 'typeorm'
import { databaseOf } from '../db/sqlite-connection'
import { AppSettingEntity } from '../settings/app-setting.entity'
import { DatabaseSessionStore } from './session-store'
import { SessionRepository } from './session.repository'

const EIGHT_HOURS_MS = 8 * 60 * 60 * 1000

/** The configured secret, or one generated on first start and kept in the database. */
async function sessionSecret(dataSource: DataSource, configured?: string): Promise<string> {
  if (configured) return configured
  const settings = dataSource.getRepository(AppSettingEntity)
  const existing = await settings.findOneBy({ key: 'session-secret' })
  if (existing) return existing.value
  const value = randomBytes(32).toString('hex')
  await settings.save({ key: 'session-secret', value })
  return value
}

/** Sessions end after eight idle hours, or `maxAgeMs` after sign-in, whichever comes first. */
export async function createSessionMiddleware(
  dataSource: DataSource,
  options: { secret?: string; maxAgeMs: number; now?: () => number; secure?: boolean | 'auto' },
) {
  const store = new DatabaseSessionStore(new SessionRepository(databaseOf(dataSource)), {
    idleMs: EIGHT_HOURS_MS,
    maxAgeMs: options.maxAgeMs,
    now: options.now,
  })
  return session({
    name: 'fitwright.sid',
    secret: await sessionSecret(dataSource, options.secret),
    store,
    resave: false,
    saveUninitialized: false,
    rolling: true,
    cookie: { httpOnly: true, sameSite: 'lax', secure: options.secure ?? 'auto', maxAge: EIGHT_HOURS_MS },
  })
}
