import type { MigrationInterface, QueryRunner } from 'typeorm'

export class Quotes1796215189078 implements MigrationInterface {
  name = 'Quotes1796215189078'

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(
      'CREATE TABLE "quote" ("id" SERIAL NOT NULL, "status" text NOT NULL DEFAULT \'draft\', "customer" text NOT NULL DEFAULT \'\', "buildSheetId" integer, "body" text NOT NULL, "createdByName" text NOT NULL, "reservedUntil" TIMESTAMP, "createdAt" TIMESTAMP NOT NULL DEFAULT now(), CONSTRAINT "PK_b772d4cb09e587c8c72a78d2439" PRIMARY KEY ("id"))',
    )
    await queryRunner.query('ALTER TABLE "stock_item" ADD "reservedUntil" TIMESTAMP')
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query('ALTER TABLE "stock_item" DROP COLUMN "reservedUntil"')
    await queryRunner.query('DROP TABLE "quote"')
  }
}
