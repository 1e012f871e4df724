import type { DataSource } from 'typeorm'
import type { AppConfig } from '../config/env'
import { copyTables } from '../db/copy-tables'
import { openDatabase } from '../db/data-source'
import type { RuleBook } from '../reasoning/rule-book'
import { createServices, type Services } from '../services'
import { demoSeedDue, seedDemo } from './seed'

/**
 * The demo scenario on PostgreSQL: seeded the usual way (imports, sheets,
 * stock) into a scratch in-memory SQLite database, whose tables are then
 * copied across in one transaction, since catalogue imports still write
 * through SQLite. Returns whether it seeded.
 */
export async function seedDemoOnPostgres(
  target: DataSource,
  users: Services['users'],
  config: AppConfig,
  rules: RuleBook,
  demoDir: string,
): Promise<boolean> {
  if (!(await demoSeedDue(target, users))) return false
  const scratch = await openDatabase({ type: 'sqlite', path: ':memory:' })
  const services = createServices(scratch, config, rules)
  try {
    await services.modifications.syncShipped(rules.loaded.modifications)
    await seedDemo(scratch, services, demoDir)
    await copyTables(scratch, target)
    return true
  } finally {
    await services.imports.close()
    await scratch.destroy()
  }
}
