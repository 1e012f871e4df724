import { promisify } from 'node:util'
import type session from 'express-session'
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { SessionRepository } from '../../server/auth/session.repository'
import { DatabaseSessionStore } from '../../server/auth/session-store'
import { databaseOf } from '../../server/db/sqlite-connection'
import { databaseDrivers, type OpenedDatabase } from '../helpers/database-drivers'

const MINUTE = 60_000
const IDLE = 30 * MINUTE
const data = { cookie: { originalMaxAge: IDLE }, passport: { user: 7 } } as unknown as session.SessionData

describe('the session store moving a session’s idle end', () => {
  let opened: OpenedDatabase
  let sessions: SessionRepository
  let clock = 1_000_000
  let store: DatabaseSessionStore
  beforeAll(async () => {
    opened = await databaseDrivers('sessions')[0]!.open()
    sessions = new SessionRepository(databaseOf(opened.dataSource))
    store = new DatabaseSessionStore(sessions, { idleMs: IDLE, maxAgeMs: 8 * 60 * MINUTE, now: () => clock })
  })
  afterAll(async () => opened.close())

  const touch = (sid: string) => promisify(store.touch.bind(store))(sid, data)
  const get = (sid: string) => promisify(store.get.bind(store))(sid)

  it('writes the new end at most once a minute, and still ends a session left idle', async () => {
    await promisify(store.set.bind(store))('busy', data)
    const started = clock
    clock += 20_000
    await touch('busy')
    expect((await sessions.find('busy'))?.expiresAt).toBe(started + IDLE)
    clock += 45_000
    await touch('busy')
    expect((await sessions.find('busy'))?.expiresAt).toBe(clock + IDLE)
    const lastEnd = clock + IDLE
    clock = lastEnd + 1
    expect(await get('busy')).toBeNull()
  })

  it('moves the end again once another process has read the session with a later end', async () => {
    await promisify(store.set.bind(store))('shared', data)
    await sessions.touch('shared', clock + IDLE + 5 * MINUTE)
    expect(await get('shared')).not.toBeNull()
    clock += 6 * MINUTE
    await touch('shared')
    expect((await sessions.find('shared'))?.expiresAt).toBe(clock + IDLE)
  })
})
