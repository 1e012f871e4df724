import type { MigrationInterface, QueryRunner } from 'typeorm'

export class StockPhotos1796229010828 implements MigrationInterface {
  name = 'StockPhotos1796229010828'

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(
      'CREATE TABLE "stock_photo" ("id" integer PRIMARY KEY AUTOINCREMENT NOT NULL, "stockItemId" integer NOT NULL, "position" integer NOT NULL, "displayKey" text NOT NULL, "thumbKey" text NOT NULL, "width" integer NOT NULL, "height" integer NOT NULL)',
    )
    await queryRunner.query('CREATE INDEX "IDX_897c7a68af25b4108a25eb3e8f" ON "stock_photo" ("stockItemId") ')
    await queryRunner.query('DROP INDEX "IDX_897c7a68af25b4108a25eb3e8f"')
    await queryRunner.query(
      'CREATE TABLE "temporary_stock_photo" ("id" integer PRIMARY KEY AUTOINCREMENT NOT NULL, "stockItemId" integer NOT NULL, "position" integer NOT NULL, "displayKey" text NOT NULL, "thumbKey" text NOT NULL, "width" integer NOT NULL, "height" integer NOT NULL, CONSTRAINT "FK_897c7a68af25b4108a25eb3e8f5" FOREIGN KEY ("stockItemId") REFERENCES "stock_item" ("id") ON DELETE CASCADE ON UPDATE NO ACTION)',
    )
    await queryRunner.query(
      'INSERT INTO "temporary_stock_photo"("id", "stockItemId", "position", "displayKey", "thumbKey", "width", "height") SELECT "id", "stockItemId", "position", "displayKey", "thumbKey", "width", "height" FROM "stock_photo"',
    )
    await queryRunner.query('DROP TABLE "stock_photo"')
    await queryRunner.query('ALTER TABLE "temporary_stock_photo" RENAME TO "stock_photo"')
    await queryRunner.query('CREATE INDEX "IDX_897c7a68af25b4108a25eb3e8f" ON "stock_photo" ("stockItemId") ')
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query('DROP INDEX "IDX_897c7a68af25b4108a25eb3e8f"')
    await queryRunner.query('ALTER TABLE "stock_photo" RENAME TO "temporary_stock_photo"')
    await queryRunner.query(
      'CREATE TABLE "stock_photo" ("id" integer PRIMARY KEY AUTOINCREMENT NOT NULL, "stockItemId" integer NOT NULL, "position" integer NOT NULL, "displayKey" text NOT NULL, "thumbKey" text NOT NULL, "width" integer NOT NULL, "height" integer NOT NULL)',
    )
    await queryRunner.query(
      'INSERT INTO "stock_photo"("id", "stockItemId", "position", "displayKey", "thumbKey", "width", "height") SELECT "id", "stockItemId", "position", "displayKey", "thumbKey", "width", "height" FROM "temporary_stock_photo"',
    )
    await queryRunner.query('DROP TABLE "temporary_stock_photo"')
    await queryRunner.query('CREATE INDEX "IDX_897c7a68af25b4108a25eb3e8f" ON "stock_photo" ("stockItemId") ')
    await queryRunner.query('DROP INDEX "IDX_897c7a68af25b4108a25eb3e8f"')
    await queryRunner.query('DROP TABLE "stock_photo"')
  }
}
