import type { MigrationInterface, QueryRunner } from 'typeorm'

export class PartListPrice1796226637373 implements MigrationInterface {
  name = 'PartListPrice1796226637373'

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query('ALTER TABLE "part" ADD "listPriceCents" integer')
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query('ALTER TABLE "part" DROP COLUMN "listPriceCents"')
  }
}
