import { randomBytes } from 'node:crypto'
import { TypeormStore } from 'connect-typeorm'
import session from 'express-session'
import type { DataSource } from 'typeorm'
import { AppSettingEntity } from '../settings/app-setting.entity'
import { SessionEntity } from './session.entity'

const EIGHT_HOURS_S = 8 * 60 * 60

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

export async function createSessionMiddleware(dataSource: DataSource, options: { secret?: string; secure?: boolean | 'auto' }) {
  const store = new TypeormStore({ cleanupLimit: 2, ttl: EIGHT_HOURS_S }).connect(dataSource.getRepository(SessionEntity))
  return session({
    name: 'fitwright.sid',
    secret: await sessionSecret(dataSource, options.secret),
    store,
    resave: false,
    saveUninitialized: false,
    rolling: true,
    cookie: { httpOnly: true, sameSite: 'lax', secure: options.secure ?? 'auto', maxAge: EIGHT_HOURS_S * 1000 },
  })
}
