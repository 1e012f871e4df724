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
if (!postgresServerUrl) console.warn('PostgreSQL tests skipped: set FITWRIGHT_TEST_PG_URL (bash .ci/run starts a server).')

export async function createPostgresDatabase(): Promise<{ url: string; drop: () => Promise<void> }> {
  if (!postgresServerUrl) throw new Error('No PostgreSQL server for tests.')
  const name = `fitwright_test_${randomBytes(6).toString('hex')}`
  const admin = new pg.Client({ connectionString: postgresServerUrl })
  await admin.connect()
  await admin.query(`CREATE DATABASE ${name}`)
  await admin.end()
  const url = new URL(postgresServerUrl)
  url.pathname = `/${name}`
  return {
    url: url.toString(),
    async drop() {
      const client = new pg.Client({ connectionString: postgresServerUrl })
      await client.connect()
      await client.query(`DROP DATABASE IF EXISTS ${name} WITH (FORCE)`)
      await client.end()
    },
  }
}
