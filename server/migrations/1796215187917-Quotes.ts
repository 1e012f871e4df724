import type { MigrationInterface, QueryRunner } from 'typeorm'

export class Quotes1796215187917 implements MigrationInterface {
  name = 'Quotes1796215187917'

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(
      'CREATE TABLE "quote" ("id" integer PRIMARY KEY AUTOINCREMENT NOT NULL, "status" text NOT NULL DEFAULT (\'draft\'), "customer" text NOT NULL DEFAULT (\'\'), "buildSheetId" integer, "body" text NOT NULL, "createdByName" text NOT NULL, "reservedUntil" datetime, "createdAt" datetime NOT NULL DEFAULT (datetime(\'now\')))',
    )
    await queryRunner.query('DROP INDEX "IDX_a47500abb433861684f55d5487"')
    await queryRunner.query('DROP INDEX "IDX_3bc0304587090e048550b98736"')
    await queryRunner.query('DROP INDEX "IDX_d3dce2237f98798ebdadbacae4"')
    await queryRunner.query(
      'CREATE TABLE "temporary_stock_item" ("id" integer PRIMARY KEY AUTOINCREMENT NOT NULL, "partId" integer NOT NULL, "siteId" integer NOT NULL, "condition" text NOT NULL, "grade" text, "mileageKm" integer, "donorVin" text, "donorYear" integer, "damageNotes" text NOT NULL DEFAULT (\'\'), "location" text NOT NULL DEFAULT (\'\'), "priceCents" integer NOT NULL, "coreChargeCents" integer NOT NULL DEFAULT (0), "status" text NOT NULL DEFAULT (\'available\'), "label" text, "createdAt" datetime NOT NULL DEFAULT (datetime(\'now\')), "updatedAt" datetime NOT NULL DEFAULT (datetime(\'now\')), "reservedUntil" datetime, CONSTRAINT "FK_d3dce2237f98798ebdadbacae46" FOREIGN KEY ("siteId") REFERENCES "site" ("id") ON DELETE RESTRICT ON UPDATE NO ACTION, CONSTRAINT "FK_e71ee43367e7708ff22454cb184" FOREIGN KEY ("partId") REFERENCES "part" ("id") ON DELETE RESTRICT ON UPDATE NO ACTION)',
    )
    await queryRunner.query(
      'INSERT INTO "temporary_stock_item"("id", "partId", "siteId", "condition", "grade", "mileageKm", "donorVin", "donorYear", "damageNotes", "location", "priceCents", "coreChargeCents", "status", "label", "createdAt", "updatedAt") SELECT "id", "partId", "siteId", "condition", "grade", "mileageKm", "donorVin", "donorYear", "damageNotes", "location", "priceCents", "coreChargeCents", "status", "label", "createdAt", "updatedAt" FROM "stock_item"',
    )
    await queryRunner.query('DROP TABLE "stock_item"')
    await queryRunner.query('ALTER TABLE "temporary_stock_item" RENAME TO "stock_item"')
    await queryRunner.query('CREATE INDEX "IDX_a47500abb433861684f55d5487" ON "stock_item" ("partId", "status") ')
    await queryRunner.query('CREATE UNIQUE INDEX "IDX_3bc0304587090e048550b98736" ON "stock_item" ("label") ')
    await queryRunner.query('CREATE INDEX "IDX_d3dce2237f98798ebdadbacae4" ON "stock_item" ("siteId") ')
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query('DROP INDEX "IDX_d3dce2237f98798ebdadbacae4"')
    await queryRunner.query('DROP INDEX "IDX_3bc0304587090e048550b98736"')
    await queryRunner.query('DROP INDEX "IDX_a47500abb433861684f55d5487"')
    await queryRunner.query('ALTER TABLE "stock_item" RENAME TO "temporary_stock_item"')
    await queryRunner.query(
      'CREATE TABLE "stock_item" ("id" integer PRIMARY KEY AUTOINCREMENT NOT NULL, "partId" integer NOT NULL, "siteId" integer NOT NULL, "condition" text NOT NULL, "grade" text, "mileageKm" integer, "donorVin" text, "donorYear" integer, "damageNotes" text NOT NULL DEFAULT (\'\'), "location" text NOT NULL DEFAULT (\'\'), "priceCents" integer NOT NULL, "coreChargeCents" integer NOT NULL DEFAULT (0), "status" text NOT NULL DEFAULT (\'available\'), "label" text, "createdAt" datetime NOT NULL DEFAULT (datetime(\'now\')), "updatedAt" datetime NOT NULL DEFAULT (datetime(\'now\')), CONSTRAINT "FK_d3dce2237f98798ebdadbacae46" FOREIGN KEY ("siteId") REFERENCES "site" ("id") ON DELETE RESTRICT ON UPDATE NO ACTION, CONSTRAINT "FK_e71ee43367e7708ff22454cb184" FOREIGN KEY ("partId") REFERENCES "part" ("id") ON DELETE RESTRICT ON UPDATE NO ACTION)',
    )
    await queryRunner.query(
      'INSERT INTO "stock_item"("id", "partId", "siteId", "condition", "grade", "mileageKm", "donorVin", "donorYear", "damageNotes", "location", "priceCents", "coreChargeCents", "status", "label", "createdAt", "updatedAt") SELECT "id", "partId", "siteId", "condition", "grade", "mileageKm", "donorVin", "donorYear", "damageNotes", "location", "priceCents", "coreChargeCents", "status", "label", "createdAt", "updatedAt" FROM "temporary_stock_item"',
    )
    await queryRunner.query('DROP TABLE "temporary_stock_item"')
    await queryRunner.query('CREATE INDEX "IDX_d3dce2237f98798ebdadbacae4" ON "stock_item" ("siteId") ')
    await queryRunner.query('CREATE UNIQUE INDEX "IDX_3bc0304587090e048550b98736" ON "stock_item" ("label") ')
    await queryRunner.query('CREATE INDEX "IDX_a47500abb433861684f55d5487" ON "stock_item" ("partId", "status") ')
    await queryRunner.query('DROP TABLE "quote"')
  }
}
