import type { MigrationInterface, QueryRunner } from 'typeorm'

export class CounterFinish1796235252157 implements MigrationInterface {
  name = 'CounterFinish1796235252157'

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(
      'CREATE TABLE "quote_unit" ("quoteId" integer NOT NULL, "stockItemId" integer NOT NULL, CONSTRAINT "PK_586154f1696256c41a8ccdca1ac" PRIMARY KEY ("quoteId", "stockItemId"))',
    )
    await queryRunner.query('CREATE INDEX "IDX_8f09c1250e9630ced956d7c67c" ON "quote_unit"  ("stockItemId") ')
    await queryRunner.query('ALTER TABLE "user" ADD "homeSiteId" integer')
    await queryRunner.query('ALTER TABLE "build_sheet" ADD "vehicleId" integer')
    await queryRunner.query('ALTER TABLE "quote" ADD "searchText" text NOT NULL DEFAULT \'\'')
    // Quotes made before this: their units and their search text, read from the body they were saved with.
    await queryRunner.query(
      `INSERT INTO "quote_unit" ("quoteId", "stockItemId") SELECT DISTINCT q."id", (l->>'stockItemId')::integer FROM "quote" q, jsonb_array_elements(q."body"::jsonb->'lines') l WHERE l ? 'stockItemId' ON CONFLICT DO NOTHING`,
    )
    await queryRunner.query(
      `UPDATE "quote" SET "searchText" = lower(trim("customer" || ' ' || COALESCE("body"::jsonb->'vehicle'->>'vin', '')))`,
    )
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query('ALTER TABLE "quote" DROP COLUMN "searchText"')
    await queryRunner.query('ALTER TABLE "build_sheet" DROP COLUMN "vehicleId"')
    await queryRunner.query('ALTER TABLE "user" DROP COLUMN "homeSiteId"')
    await queryRunner.query('DROP INDEX "public"."IDX_8f09c1250e9630ced956d7c67c"')
    await queryRunner.query('DROP TABLE "quote_unit"')
  }
}
