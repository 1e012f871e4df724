/**
 * Writes a migration with the SQL that brings the migrated schema up to the
 * entities (what `typeorm migration:generate` does), without a CLI config.
 * Usage: npx tsx server/db/generate-migration.ts <PascalName> [--postgres]
 * With --postgres it diffs against FITWRIGHT_DATABASE_URL (a scratch database:
 * its migrations are run first) and writes to server/migrations/postgres/.
 * Write both for every entity change.
 */
import 'reflect-metadata'
import { writeFileSync } from 'node:fs'
import { openDatabase } from './data-source'

const name = process.argv[2]
if (!name || !/^[A-Z][A-Za-z0-9]+$/.test(name)) {
  console.error('Give the migration a PascalCase name.')
  process.exit(1)
}
const postgres = process.argv.includes('--postgres')
const url = process.env.FITWRIGHT_DATABASE_URL
if (postgres && !url) {
  console.error('Set FITWRIGHT_DATABASE_URL to a scratch PostgreSQL database.')
  process.exit(1)
}
const dataSource = await openDatabase(postgres && url ? { type: 'postgres', url } : { type: 'sqlite', path: ':memory:' })
const sql = await dataSource.driver.createSchemaBuilder().log()
if (sql.upQueries.length === 0) {
  console.log('Schema is up to date; nothing to write.')
  process.exit(0)
}
const timestamp = Date.now()
const quote = (query: string) => JSON.stringify(query)
const up = sql.upQueries.map((q) => `    await queryRunner.query(${quote(q.query)})`).join('\n')
const down = sql.downQueries
  .reverse()
  .map((q) => `    await queryRunner.query(${quote(q.query)})`)
  .join('\n')
const className = `${name}${timestamp}`
const file = `server/migrations/${postgres ? 'postgres/' : ''}${timestamp}-${name}.ts`
writeFileSync(
  file,
  `import type { MigrationInterface, QueryRunner } from 'typeorm'

export class ${className} implements MigrationInterface {
  name = '${className}'

  async up(queryRunner: QueryRunner): Promise<void> {
${up}
  }

  async down(queryRunner: QueryRunner): Promise<void> {
${down}
  }
}
`,
)
console.log(`Wrote ${file}; add ${className} to ${postgres ? 'postgresMigrations' : 'migrations'} in server/db/migrations.ts.`)
await dataSource.destroy()
