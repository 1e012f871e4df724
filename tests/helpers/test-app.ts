import { copyFileSync, mkdtempSync, rmSync } from 'node:fs'
import { tmpdir } from 'node:os'
import path from 'node:path'
import type { Express } from 'express'
import request from 'supertest'
import type { DataSource } from 'typeorm'
import { createApp } from '../../server/app'
import { prepareDatabase } from '../../server/bootstrap'
import { loadConfig, type AppConfig } from '../../server/config/env'
import { DEMO_PASSWORD } from '../../server/demo/seed'
import type { Role } from '../../shared/schemas/auth'
import type { Services } from '../../server/services'
import type { ChangeFollower } from '../../server/follow-changes'
import type { Database } from '../../server/db/database'
import { databaseOf } from '../../server/db/sqlite-connection'
import { createPostgresDatabase, dropWhenFileEnds, postgresServerUrl, type TestDatabase } from './postgres'

/**
 * `FITWRIGHT_TEST_DB=postgres` runs every test app on a fresh PostgreSQL
 * database of the test server (see ./postgres) instead of a SQLite file.
 */
export const testOnPostgres = process.env.FITWRIGHT_TEST_DB === 'postgres'
if (testOnPostgres && !postgresServerUrl) throw new Error('FITWRIGHT_TEST_DB=postgres needs FITWRIGHT_TEST_PG_URL.')

export type TestApp = {
  app: Express
  dataSource: DataSource
  /** The data port, for SQL written behind the API (it runs on either database). */
  db: Database
  config: AppConfig
  /** The app's services, for tests that write behind the API and report it as writers do. */
  services: Services
  /** Other servers' writes followed on PostgreSQL (null on SQLite). */
  changes: ChangeFollower | null
  /** A supertest agent signed in as the demo user of that role. */
  signIn: (role: Role) => Promise<ReturnType<typeof request.agent>>
  close: () => Promise<void>
}

/** Fetches the session's CSRF token and sends it with every later request of the agent (call again after sign-in). */
export async function withCsrf(agent: ReturnType<typeof request.agent>) {
  const { body } = await agent.get('/api/auth/csrf')
  agent.set('x-csrf-token', (body as { token: string }).token)
  return agent
}

/** An agent with no one signed in yet, carrying a CSRF token, as the sign-in page has one. */
export function anonymous(app: Express) {
  return withCsrf(request.agent(app))
}

let demoTemplate: Promise<string> | null = null
let postgresTemplate: Promise<TestDatabase> | null = null

/** The PostgreSQL twin of the demo template: a seeded database that each app's database is created from. */
function postgresDemoTemplate(): Promise<TestDatabase> {
  postgresTemplate ??= (async () => {
    const template = await createPostgresDatabase()
    dropWhenFileEnds(template)
    const prepared = await prepareDatabase(loadConfig({ NODE_ENV: 'test', FITWRIGHT_DATABASE_URL: template.url, FITWRIGHT_DEMO: '1' }))
    await prepared.changes?.close()
    await prepared.services.imports.close()
    await prepared.dataSource.destroy()
    return template
  })()
  return postgresTemplate
}

/** Where one test app keeps its data: a SQLite file in its folder, or a PostgreSQL database of its own. */
async function testDatabase(
  dir: string,
  copyDemo: boolean,
  postgres: boolean,
): Promise<{ env: Record<string, string>; drop: () => Promise<void> }> {
  if (!postgres) {
    if (copyDemo) copyFileSync(await demoTemplatePath(), path.join(dir, 'test.sqlite'))
    return { env: { FITWRIGHT_DB_PATH: path.join(dir, 'test.sqlite') }, drop: async () => {} }
  }
  const database = await createPostgresDatabase(copyDemo ? (await postgresDemoTemplate()).name : undefined)
  return { env: { FITWRIGHT_DATABASE_URL: database.url }, drop: database.drop }
}

/**
 * One migrated, seeded demo database per test worker; each app gets its own
 * copy, so tests stay independent without paying for the seed every time.
 */
function demoTemplatePath(): Promise<string> {
  demoTemplate ??= (async () => {
    const dir = mkdtempSync(path.join(tmpdir(), 'fitwright-template-'))
    const file = path.join(dir, 'template.sqlite')
    const { dataSource, services } = await prepareDatabase(loadConfig({ NODE_ENV: 'test', FITWRIGHT_DB_PATH: file, FITWRIGHT_DEMO: '1' }))
    await services.imports.close()
    await dataSource.query('PRAGMA wal_checkpoint(TRUNCATE)')
    await dataSource.destroy()
    return file
  })()
  return demoTemplate
}

/** A fresh app on its own temporary SQLite file, seeded with the demo scenario unless told not to. */
export async function createTestApp(
  options: {
    demo?: boolean
    env?: Record<string, string>
    /** On PostgreSQL whatever FITWRIGHT_TEST_DB says. */
    postgres?: boolean
    /** A second server on the first one's PostgreSQL database (the first one drops it). */
    sameDatabaseAs?: TestApp
  } = {},
): Promise<TestApp> {
  const dir = mkdtempSync(path.join(tmpdir(), 'fitwright-test-'))
  const seedsDifferently = Object.keys(options.env ?? {}).some((key) => /^FITWRIGHT_(DEMO|ADMIN_)/.test(key))
  const shared = options.sameDatabaseAs?.config.databaseUrl
  if (options.sameDatabaseAs && !shared) throw new Error('Only a PostgreSQL database is shared between test servers.')
  const database = shared
    ? { env: { FITWRIGHT_DATABASE_URL: shared }, drop: async () => {} }
    : await testDatabase(dir, options.demo !== false && !seedsDifferently, options.postgres ?? testOnPostgres)
  const config = loadConfig({
    NODE_ENV: 'test',
    ...database.env,
    FITWRIGHT_DEMO: options.demo === false ? '0' : '1',
    FITWRIGHT_UPLOAD_DIR: path.join(dir, 'uploads'),
    FITWRIGHT_MAIL_DIR: path.join(dir, 'mail'),
    ...options.env,
  })
  const { dataSource, services, changes } = await prepareDatabase(config)
  const app = await createApp({ config, dataSource, services, version: 'test' })
  return {
    app,
    dataSource,
    db: databaseOf(dataSource),
    config,
    services,
    changes,
    async signIn(role) {
      const agent = await anonymous(app)
      const response = await agent.post('/api/auth/login').send({ email: `${role}@fitwright.test`, password: DEMO_PASSWORD })
      if (response.status !== 200) throw new Error(`Sign-in as ${role} failed: ${response.status}`)
      await withCsrf(agent)
      return agent
    },
    async close() {
      await services.accounts.resetsQueued()
      await services.outbox.stop()
      await changes?.close()
      await services.imports.close()
      await dataSource.destroy()
      await database.drop()
      rmSync(dir, { recursive: true, force: true })
    },
  }
}
