import type { MigrationInterface, QueryRunner } from 'typeorm'

export class ImportVehiclesStock1796223370557 implements MigrationInterface {
  name = 'ImportVehiclesStock1796223370557'

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query('DROP INDEX "IDX_d3dce2237f98798ebdadbacae4"')
    await queryRunner.query('DROP INDEX "IDX_3bc0304587090e048550b98736"')
    await queryRunner.query('DROP INDEX "IDX_a47500abb433861684f55d5487"')
    await queryRunner.query(
      'CREATE TABLE "temporary_stock_item" ("id" integer PRIMARY KEY AUTOINCREMENT NOT NULL, "partId" integer NOT NULL, "siteId" integer NOT NULL, "condition" text NOT NULL, "grade" text, "mileageKm" integer, "donorVin" text, "donorYear" integer, "damageNotes" text NOT NULL DEFAULT (\'\'), "location" text NOT NULL DEFAULT (\'\'), "priceCents" integer NOT NULL, "coreChargeCents" integer NOT NULL DEFAULT (0), "status" text NOT NULL DEFAULT (\'available\'), "label" text, "createdAt" datetime NOT NULL DEFAULT (datetime(\'now\')), "updatedAt" datetime NOT NULL DEFAULT (datetime(\'now\')), "reservedUntil" datetime, "batchId" integer, CONSTRAINT "FK_e71ee43367e7708ff22454cb184" FOREIGN KEY ("partId") REFERENCES "part" ("id") ON DELETE RESTRICT ON UPDATE NO ACTION, CONSTRAINT "FK_d3dce2237f98798ebdadbacae46" FOREIGN KEY ("siteId") REFERENCES "site" ("id") ON DELETE RESTRICT ON UPDATE NO ACTION)',
    )
    await queryRunner.query(
      'INSERT INTO "temporary_stock_item"("id", "partId", "siteId", "condition", "grade", "mileageKm", "donorVin", "donorYear", "damageNotes", "location", "priceCents", "coreChargeCents", "status", "label", "createdAt", "updatedAt", "reservedUntil") SELECT "id", "partId", "siteId", "condition", "grade", "mileageKm", "donorVin", "donorYear", "damageNotes", "location", "priceCents", "coreChargeCents", "status", "label", "createdAt", "updatedAt", "reservedUntil" FROM "stock_item"',
    )
    await queryRunner.query('DROP TABLE "stock_item"')
    await queryRunner.query('ALTER TABLE "temporary_stock_item" RENAME TO "stock_item"')
    await queryRunner.query('CREATE INDEX "IDX_d3dce2237f98798ebdadbacae4" ON "stock_item" ("siteId") ')
    await queryRunner.query('CREATE UNIQUE INDEX "IDX_3bc0304587090e048550b98736" ON "stock_item" ("label") ')
    await queryRunner.query('CREATE INDEX "IDX_a47500abb433861684f55d5487" ON "stock_item" ("partId", "status") ')
    await queryRunner.query('DROP INDEX "IDX_78bdc3277cce3bc2589f47bd25"')
    await queryRunner.query('DROP INDEX "IDX_2482d4c50ed5671e18b1fb5d91"')
    await queryRunner.query(
      'CREATE TABLE "temporary_vehicle_application" ("id" integer PRIMARY KEY AUTOINCREMENT NOT NULL, "yearFrom" integer NOT NULL, "yearTo" integer NOT NULL, "make" text NOT NULL, "model" text NOT NULL, "body" text NOT NULL DEFAULT (\'\'), "market" text NOT NULL DEFAULT (\'\'), "engineFamily" text NOT NULL, "batchId" integer)',
    )
    await queryRunner.query(
      'INSERT INTO "temporary_vehicle_application"("id", "yearFrom", "yearTo", "make", "model", "body", "market", "engineFamily") SELECT "id", "yearFrom", "yearTo", "make", "model", "body", "market", "engineFamily" FROM "vehicle_application"',
    )
    await queryRunner.query('DROP TABLE "vehicle_application"')
    await queryRunner.query('ALTER TABLE "temporary_vehicle_application" RENAME TO "vehicle_application"')
    await queryRunner.query('CREATE INDEX "IDX_78bdc3277cce3bc2589f47bd25" ON "vehicle_application" ("make", "model") ')
    await queryRunner.query('CREATE INDEX "IDX_2482d4c50ed5671e18b1fb5d91" ON "vehicle_application" ("yearFrom") ')
    await queryRunner.query('CREATE INDEX "IDX_d4f3ac91515414f3700b8ae09d" ON "stock_item" ("batchId") ')
    await queryRunner.query('CREATE INDEX "IDX_6b31beae7e3e4a94efacb20a59" ON "vehicle_application" ("batchId") ')
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query('DROP INDEX "IDX_6b31beae7e3e4a94efacb20a59"')
    await queryRunner.query('DROP INDEX "IDX_d4f3ac91515414f3700b8ae09d"')
    await queryRunner.query('DROP INDEX "IDX_2482d4c50ed5671e18b1fb5d91"')
    await queryRunner.query('DROP INDEX "IDX_78bdc3277cce3bc2589f47bd25"')
    await queryRunner.query('ALTER TABLE "vehicle_application" RENAME TO "temporary_vehicle_application"')
    await queryRunner.query(
      'CREATE TABLE "vehicle_application" ("id" integer PRIMARY KEY AUTOINCREMENT NOT NULL, "yearFrom" integer NOT NULL, "yearTo" integer NOT NULL, "make" text NOT NULL, "model" text NOT NULL, "body" text NOT NULL DEFAULT (\'\'), "market" text NOT NULL DEFAULT (\'\'), "engineFamily" text NOT NULL)',
    )
    await queryRunner.query(
      'INSERT INTO "vehicle_application"("id", "yearFrom", "yearTo", "make", "model", "body", "market", "engineFamily") SELECT "id", "yearFrom", "yearTo", "make", "model", "body", "market", "engineFamily" FROM "temporary_vehicle_application"',
    )
    await queryRunner.query('DROP TABLE "temporary_vehicle_application"')
    await queryRunner.query('CREATE INDEX "IDX_2482d4c50ed5671e18b1fb5d91" ON "vehicle_application" ("yearFrom") ')
    await queryRunner.query('CREATE INDEX "IDX_78bdc3277cce3bc2589f47bd25" ON "vehicle_application" ("make", "model") ')
    await queryRunner.query('DROP INDEX "IDX_a47500abb433861684f55d5487"')
    await queryRunner.query('DROP INDEX "IDX_3bc0304587090e048550b98736"')
    await queryRunner.query('DROP INDEX "IDX_d3dce2237f98798ebdadbacae4"')
    await queryRunner.query('ALTER TABLE "stock_item" RENAME TO "temporary_stock_item"')
    await queryRunner.query(
      'CREATE TABLE "stock_item" ("id" integer PRIMARY KEY AUTOINCREMENT NOT NULL, "partId" integer NOT NULL, "siteId" integer NOT NULL, "condition" text NOT NULL, "grade" text, "mileageKm" integer, "donorVin" text, "donorYear" integer, "damageNotes" text NOT NULL DEFAULT (\'\'), "location" text NOT NULL DEFAULT (\'\'), "priceCents" integer NOT NULL, "coreChargeCents" integer NOT NULL DEFAULT (0), "status" text NOT NULL DEFAULT (\'available\'), "label" text, "createdAt" datetime NOT NULL DEFAULT (datetime(\'now\')), "updatedAt" datetime NOT NULL DEFAULT (datetime(\'now\')), "reservedUntil" datetime, CONSTRAINT "FK_e71ee43367e7708ff22454cb184" FOREIGN KEY ("partId") REFERENCES "part" ("id") ON DELETE RESTRICT ON UPDATE NO ACTION, CONSTRAINT "FK_d3dce2237f98798ebdadbacae46" FOREIGN KEY ("siteId") REFERENCES "site" ("id") ON DELETE RESTRICT ON UPDATE NO ACTION)',
    )
    await queryRunner.query(
      'INSERT INTO "stock_item"("id", "partId", "siteId", "condition", "grade", "mileageKm", "donorVin", "donorYear", "damageNotes", "location", "priceCents", "coreChargeCents", "status", "label", "createdAt", "updatedAt", "reservedUntil") SELECT "id", "partId", "siteId", "condition", "grade", "mileageKm", "donorVin", "donorYear", "damageNotes", "location", "priceCents", "coreChargeCents", "status", "label", "createdAt", "updatedAt", "reservedUntil" FROM "temporary_stock_item"',
    )
    await queryRunner.query('DROP TABLE "temporary_stock_item"')
    await queryRunner.query('CREATE INDEX "IDX_a47500abb433861684f55d5487" ON "stock_item" ("partId", "status") ')
    await queryRunner.query('CREATE UNIQUE INDEX "IDX_3bc0304587090e048550b98736" ON "stock_item" ("label") ')
    await queryRunner.query('CREATE INDEX "IDX_d3dce2237f98798ebdadbacae4" ON "stock_item" ("siteId") ')
  }
}
