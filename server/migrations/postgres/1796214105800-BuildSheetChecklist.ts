import type { MigrationInterface, QueryRunner } from 'typeorm'

/* Written by hand (no PostgreSQL server at hand to generate it): the same columns as the SQLite migration. */
export class BuildSheetChecklist1796214105800 implements MigrationInterface {
  name = 'BuildSheetChecklist1796214105800'

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query('ALTER TABLE "build_sheet" ADD "checklist" text NOT NULL DEFAULT \'{}\'')
    await queryRunner.query('ALTER TABLE "build_sheet" ADD "savedVerdict" text')
    await queryRunner.query('ALTER TABLE "build_sheet" ADD "labourMinutes" integer')
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query('ALTER TABLE "build_sheet" DROP COLUMN "labourMinutes"')
    await queryRunner.query('ALTER TABLE "build_sheet" DROP COLUMN "savedVerdict"')
    await queryRunner.query('ALTER TABLE "build_sheet" DROP COLUMN "checklist"')
  }
}
