import { mkdtempSync, rmSync } from 'node:fs'
import { tmpdir } from 'node:os'
import path from 'node:path'
import 'reflect-metadata'
import type { DataSource } from 'typeorm'
import { openDatabase } from '../../server/db/data-source'
import { createPostgresDatabase, postgresServerUrl } from './postgres'

if (!postgresServerUrl) console.warn('PostgreSQL tests skipped: set FITWRIGHT_TEST_PG_URL (bash .ci/run starts a server).')

export type OpenedDatabase = { dataSource: DataSource; close: () => Promise<void> }
export type DatabaseDriver = { name: 'sqlite' | 'postgres'; open: () => Promise<OpenedDatabase> }

/**
 * The drivers a test file runs its cases on: a fresh SQLite file, and a fresh
 * PostgreSQL database when a server is there (see ./postgres). Each open() is migrated.
 */
export function databaseDrivers(label: string): DatabaseDriver[] {
  const drivers: DatabaseDriver[] = [
    {
      name: 'sqlite',
      async open() {
        const dir = mkdtempSync(path.join(tmpdir(), `fitwright-${label}-`))
        const dataSource = await openDatabase({ type: 'sqlite', path: path.join(dir, `${label}.sqlite`) })
        return {
          dataSource,
          close: async () => {
            await dataSource.destroy()
            rmSync(dir, { recursive: true, force: true })
          },
        }
      },
    },
  ]
  if (postgresServerUrl) {
    drivers.push({
      name: 'postgres',
      async open() {
        const database = await createPostgresDatabase()
        const dataSource = await openDatabase({ type: 'postgres', url: database.url })
        return {
          dataSource,
          close: async () => {
            await dataSource.destroy()
            await database.drop()
          },
        }
      },
    })
  }
  return drivers
}
