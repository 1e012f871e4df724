import type { MigrationInterface, QueryRunner } from 'typeorm'

export class WordPartIndex1796291212029 implements MigrationInterface {
  name = 'WordPartIndex1796291212029'

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query('DROP INDEX "IDX_e13831c3aa6f47e0b21ef61600"')
    await queryRunner.query('CREATE INDEX "IDX_03ef4bc2c60219f0e1613cba8b" ON "part_word" ("word", "partId") ')
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query('DROP INDEX "IDX_03ef4bc2c60219f0e1613cba8b"')
    await queryRunner.query('CREATE INDEX "IDX_e13831c3aa6f47e0b21ef61600" ON "part_word" ("word") ')
  }
}
