/**
 * Writes a migration with the SQL that brings the migrated schema up to the
 * entities (what `typeorm migration:generate` does), without a CLI config.
 * Usage: npx tsx server/db/generate-migration.ts <PascalName>
 */
import 'reflect-metadata'
import { writeFileSync } from 'node:fs'
import { openDatabase } from './data-source'

const name = process.argv[2]
if (!name || !/^[A-Z][A-Za-z0-9]+$/.test(name)) {
  console.error('Give the migration a PascalCase name.')
  process.exit(1)
}
const dataSource = await openDatabase(':memory:')
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
const file = `server/migrations/${timestamp}-${name}.ts`
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
console.log(`Wrote ${file}; add ${className} to server/db/migrations.ts.`)
await dataSource.destroy()
