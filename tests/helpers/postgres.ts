import { randomBytes } from 'node:crypto'
import pg from 'pg'

/**
 * A throwaway PostgreSQL database for a test file, on the server named by
 * FITWRIGHT_TEST_PG_URL (`.ci/run` starts one). Without it the PostgreSQL
 * half of a test is skipped with a notice, unless FITWRIGHT_PG=required.
 */
export const postgresServerUrl = process.env.FITWRIGHT_TEST_PG_URL

if (!postgresServerUrl && process.env.FITWRIGHT_PG === 'required') {
  throw new Error('FITWRIGHT_PG=required but FITWRIGHT_TEST_PG_URL is not set.')
}

export type TestDatabase = { name: string; url: string; drop: () => Promise<void> }

/** A new empty database, or a copy of `template` (a database no one is connected to). */
export async function createPostgresDatabase(template?: string): Promise<TestDatabase> {
  if (!postgresServerUrl) throw new Error('No PostgreSQL server for tests.')
  const name = `fitwright_test_${randomBytes(6).toString('hex')}`
  const admin = new pg.Client({ connectionString: postgresServerUrl })
  await admin.connect()
  try {
    await admin.query(`CREATE DATABASE ${name}${template ? ` TEMPLATE ${template}` : ''}`)
  } finally {
    await admin.end()
  }
  const url = new URL(postgresServerUrl)
  url.pathname = `/${name}`
  return {
    name,
    url: url.toString(),
    async drop() {
      const client = new pg.Client({ connectionString: postgresServerUrl })
      await client.connect()
      await client.query(`DROP DATABASE IF EXISTS ${name} WITH (FORCE)`)
      await client.end()
    },
  }
}

const leftForLater: TestDatabase[] = []

/** Drops `database` when the test file ends (see server-setup.ts): for templates shared by the file's tests. */
export function dropWhenFileEnds(database: TestDatabase) {
  leftForLater.push(database)
}

export async function dropLeftDatabases() {
  for (const database of leftForLater.splice(0)) await database.drop()
}
