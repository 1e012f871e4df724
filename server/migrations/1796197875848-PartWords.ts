import type { MigrationInterface, QueryRunner } from 'typeorm'
import { wordsOf } from '../catalogue/part-words'

/** The word index behind search by name and family, filled for the parts already catalogued. */
export class PartWords1796197875848 implements MigrationInterface {
  name = 'PartWords1796197875848'

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(
      'CREATE TABLE "part_word" ("partId" integer NOT NULL, "word" text NOT NULL, CONSTRAINT "FK_4fd4d77e8563f231a9ca1464e55" FOREIGN KEY ("partId") REFERENCES "part" ("id") ON DELETE CASCADE ON UPDATE NO ACTION, PRIMARY KEY ("partId", "word"))',
    )
    await queryRunner.query('CREATE INDEX "IDX_e13831c3aa6f47e0b21ef61600" ON "part_word" ("word") ')
    const numbered = queryRunner.connection.driver.options.type === 'postgres'
    const parts = (await queryRunner.query('SELECT "id", "name", "family" FROM "part" ORDER BY "id"')) as {
      id: number
      name: string
      family: string
    }[]
    const rows = parts.flatMap((part) => wordsOf(part.name, part.family).map((word) => [part.id, word] as const))
    for (let start = 0; start < rows.length; start += 400) {
      const batch = rows.slice(start, start + 400)
      const values = batch.map((_, i) => (numbered ? `($${2 * i + 1}, $${2 * i + 2})` : '(?, ?)')).join(', ')
      await queryRunner.query(`INSERT INTO "part_word" ("partId", "word") VALUES ${values}`, batch.flat())
    }
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query('DROP INDEX "IDX_e13831c3aa6f47e0b21ef61600"')
    await queryRunner.query('DROP TABLE "part_word"')
  }
}
