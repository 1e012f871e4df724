import { readFileSync } from 'node:fs'
import path from 'node:path'
import { fileURLToPath } from 'node:url'
import type { DataSource } from 'typeorm'
import type { AppConfig } from './config/env'
import { openDatabase } from './db/data-source'
import { DEMO_PASSWORD, DEMO_USERS, seedDemo } from './demo/seed'
import { UserService } from './users/user.service'
import { createServices, type Services } from './services'
import { RuleBook } from './reasoning/rule-book'
import { loadRules } from './reasoning/rule-loader'
import { followOtherServers, type ChangeFollower } from './follow-changes'

export const projectRoot = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '..')

export function readVersion(): string {
  const pkg = JSON.parse(readFileSync(path.join(projectRoot, 'package.json'), 'utf8')) as { version: string }
  return pkg.version
}

export type Prepared = {
  dataSource: DataSource
  rules: RuleBook
  services: Services
  seeded: boolean
  /** Other servers' writes on a shared PostgreSQL database, followed as deltas (null on SQLite). */
  changes: ChangeFollower | null
}

/** Accounts that still sign in with the published demo password (start-up warns about them). */
export async function demoAccountsLeft(dataSource: DataSource): Promise<string[]> {
  return (
    await new UserService(dataSource).withPassword(
      DEMO_USERS.map((user) => user.email),
      DEMO_PASSWORD,
    )
  ).map((user) => user.email)
}

/**
 * Opens and migrates the database, builds every service once, then seeds the
 * demo scenario through those services when asked and the database is empty.
 */
export async function prepareDatabase(config: AppConfig): Promise<Prepared> {
  // Rules first: a broken rule file stops start-up before anything is written.
  const rules = new RuleBook(loadRules(path.join(projectRoot, 'rules')))
  const dbPath = config.dbPath === ':memory:' ? ':memory:' : path.resolve(projectRoot, config.dbPath)
  const dataSource = await openDatabase(
    config.databaseUrl ? { type: 'postgres', url: config.databaseUrl } : { type: 'sqlite', path: dbPath },
  )
  const serviceConfig = {
    ...config,
    uploadDir: path.resolve(projectRoot, config.uploadDir),
    mailDir: path.resolve(projectRoot, config.mailDir),
  }
  const services = createServices(dataSource, serviceConfig, rules)
  await services.modifications.syncShipped(rules.loaded.modifications)
  const demoDir = path.join(projectRoot, 'data', 'demo')
  const seeded = config.demo ? await seedDemo(dataSource, services, demoDir) : false
  if (config.firstAdmin && (await services.users.count()) === 0) {
    await services.users.create({ ...config.firstAdmin, name: 'Administrator', role: 'admin' })
  }
  // A crash mid-upload leaves temporary photo files behind; nothing refers to them.
  await services.photos.removeStaleTemporaries()
  // The fit graph is read once, here, before the app answers; writes then apply to it as deltas.
  await services.graphIndex.load()
  await services.stockIndex.load()
  const changes = config.databaseUrl ? await followOtherServers(config.databaseUrl, services) : null
  return { dataSource, rules, services, seeded, changes }
}
