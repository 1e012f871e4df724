import type { MigrationInterface, QueryRunner } from 'typeorm'

export class CounterFinish1796235249342 implements MigrationInterface {
  name = 'CounterFinish1796235249342'

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(
      'CREATE TABLE "quote_unit" ("quoteId" integer NOT NULL, "stockItemId" integer NOT NULL, PRIMARY KEY ("quoteId", "stockItemId"))',
    )
    await queryRunner.query('CREATE INDEX "IDX_8f09c1250e9630ced956d7c67c" ON "quote_unit" ("stockItemId") ')
    await queryRunner.query(
      'CREATE TABLE "temporary_user" ("id" integer PRIMARY KEY AUTOINCREMENT NOT NULL, "email" text NOT NULL, "name" text NOT NULL, "role" text NOT NULL, "passwordHash" text NOT NULL, "createdAt" datetime NOT NULL DEFAULT (datetime(\'now\')), "disabledAt" datetime, "homeSiteId" integer, CONSTRAINT "UQ_e12875dfb3b1d92d7d7c5377e22" UNIQUE ("email"))',
    )
    await queryRunner.query(
      'INSERT INTO "temporary_user"("id", "email", "name", "role", "passwordHash", "createdAt", "disabledAt") SELECT "id", "email", "name", "role", "passwordHash", "createdAt", "disabledAt" FROM "user"',
    )
    await queryRunner.query('DROP TABLE "user"')
    await queryRunner.query('ALTER TABLE "temporary_user" RENAME TO "user"')
    await queryRunner.query('DROP INDEX "IDX_540bb6362dd999a52e5d10b993"')
    await queryRunner.query(
      'CREATE TABLE "temporary_build_sheet" ("id" integer PRIMARY KEY AUTOINCREMENT NOT NULL, "ownerId" integer NOT NULL, "name" text NOT NULL, "slots" text NOT NULL, "targetPowerKw" real, "fuelOctane" real, "chassisModelYear" integer, "vin" text, "notes" text NOT NULL DEFAULT (\'\'), "createdAt" datetime NOT NULL DEFAULT (datetime(\'now\')), "updatedAt" datetime NOT NULL DEFAULT (datetime(\'now\')), "checklist" text NOT NULL DEFAULT (\'{}\'), "savedVerdict" text, "labourMinutes" integer, "vehicleId" integer, CONSTRAINT "FK_540bb6362dd999a52e5d10b9938" FOREIGN KEY ("ownerId") REFERENCES "user" ("id") ON DELETE CASCADE ON UPDATE NO ACTION)',
    )
    await queryRunner.query(
      'INSERT INTO "temporary_build_sheet"("id", "ownerId", "name", "slots", "targetPowerKw", "fuelOctane", "chassisModelYear", "vin", "notes", "createdAt", "updatedAt", "checklist", "savedVerdict", "labourMinutes") SELECT "id", "ownerId", "name", "slots", "targetPowerKw", "fuelOctane", "chassisModelYear", "vin", "notes", "createdAt", "updatedAt", "checklist", "savedVerdict", "labourMinutes" FROM "build_sheet"',
    )
    await queryRunner.query('DROP TABLE "build_sheet"')
    await queryRunner.query('ALTER TABLE "temporary_build_sheet" RENAME TO "build_sheet"')
    await queryRunner.query('CREATE INDEX "IDX_540bb6362dd999a52e5d10b993" ON "build_sheet" ("ownerId") ')
    await queryRunner.query(
      'CREATE TABLE "temporary_quote" ("id" integer PRIMARY KEY AUTOINCREMENT NOT NULL, "status" text NOT NULL DEFAULT (\'draft\'), "customer" text NOT NULL DEFAULT (\'\'), "buildSheetId" integer, "body" text NOT NULL, "createdByName" text NOT NULL, "reservedUntil" datetime, "createdAt" datetime NOT NULL DEFAULT (datetime(\'now\')), "searchText" text NOT NULL DEFAULT (\'\'))',
    )
    await queryRunner.query(
      'INSERT INTO "temporary_quote"("id", "status", "customer", "buildSheetId", "body", "createdByName", "reservedUntil", "createdAt") SELECT "id", "status", "customer", "buildSheetId", "body", "createdByName", "reservedUntil", "createdAt" FROM "quote"',
    )
    await queryRunner.query('DROP TABLE "quote"')
    await queryRunner.query('ALTER TABLE "temporary_quote" RENAME TO "quote"')
    // Quotes made before this: their units and their search text, read from the body they were saved with.
    await queryRunner.query(
      `INSERT OR IGNORE INTO "quote_unit" ("quoteId", "stockItemId") SELECT q."id", json_extract(l.value, '$.stockItemId') FROM "quote" q, json_each(q."body", '$.lines') l WHERE json_extract(l.value, '$.stockItemId') IS NOT NULL`,
    )
    await queryRunner.query(
      `UPDATE "quote" SET "searchText" = lower(trim("customer" || ' ' || COALESCE(json_extract("body", '$.vehicle.vin'), '')))`,
    )
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query('ALTER TABLE "quote" RENAME TO "temporary_quote"')
    await queryRunner.query(
      'CREATE TABLE "quote" ("id" integer PRIMARY KEY AUTOINCREMENT NOT NULL, "status" text NOT NULL DEFAULT (\'draft\'), "customer" text NOT NULL DEFAULT (\'\'), "buildSheetId" integer, "body" text NOT NULL, "createdByName" text NOT NULL, "reservedUntil" datetime, "createdAt" datetime NOT NULL DEFAULT (datetime(\'now\')))',
    )
    await queryRunner.query(
      'INSERT INTO "quote"("id", "status", "customer", "buildSheetId", "body", "createdByName", "reservedUntil", "createdAt") SELECT "id", "status", "customer", "buildSheetId", "body", "createdByName", "reservedUntil", "createdAt" FROM "temporary_quote"',
    )
    await queryRunner.query('DROP TABLE "temporary_quote"')
    await queryRunner.query('DROP INDEX "IDX_540bb6362dd999a52e5d10b993"')
    await queryRunner.query('ALTER TABLE "build_sheet" RENAME TO "temporary_build_sheet"')
    await queryRunner.query(
      'CREATE TABLE "build_sheet" ("id" integer PRIMARY KEY AUTOINCREMENT NOT NULL, "ownerId" integer NOT NULL, "name" text NOT NULL, "slots" text NOT NULL, "targetPowerKw" real, "fuelOctane" real, "chassisModelYear" integer, "vin" text, "notes" text NOT NULL DEFAULT (\'\'), "createdAt" datetime NOT NULL DEFAULT (datetime(\'now\')), "updatedAt" datetime NOT NULL DEFAULT (datetime(\'now\')), "checklist" text NOT NULL DEFAULT (\'{}\'), "savedVerdict" text, "labourMinutes" integer, CONSTRAINT "FK_540bb6362dd999a52e5d10b9938" FOREIGN KEY ("ownerId") REFERENCES "user" ("id") ON DELETE CASCADE ON UPDATE NO ACTION)',
    )
    await queryRunner.query(
      'INSERT INTO "build_sheet"("id", "ownerId", "name", "slots", "targetPowerKw", "fuelOctane", "chassisModelYear", "vin", "notes", "createdAt", "updatedAt", "checklist", "savedVerdict", "labourMinutes") SELECT "id", "ownerId", "name", "slots", "targetPowerKw", "fuelOctane", "chassisModelYear", "vin", "notes", "createdAt", "updatedAt", "checklist", "savedVerdict", "labourMinutes" FROM "temporary_build_sheet"',
    )
    await queryRunner.query('DROP TABLE "temporary_build_sheet"')
    await queryRunner.query('CREATE INDEX "IDX_540bb6362dd999a52e5d10b993" ON "build_sheet" ("ownerId") ')
    await queryRunner.query('ALTER TABLE "user" RENAME TO "temporary_user"')
    await queryRunner.query(
      'CREATE TABLE "user" ("id" integer PRIMARY KEY AUTOINCREMENT NOT NULL, "email" text NOT NULL, "name" text NOT NULL, "role" text NOT NULL, "passwordHash" text NOT NULL, "createdAt" datetime NOT NULL DEFAULT (datetime(\'now\')), "disabledAt" datetime, CONSTRAINT "UQ_e12875dfb3b1d92d7d7c5377e22" UNIQUE ("email"))',
    )
    await queryRunner.query(
      'INSERT INTO "user"("id", "email", "name", "role", "passwordHash", "createdAt", "disabledAt") SELECT "id", "email", "name", "role", "passwordHash", "createdAt", "disabledAt" FROM "temporary_user"',
    )
    await queryRunner.query('DROP TABLE "temporary_user"')
    await queryRunner.query('DROP INDEX "IDX_8f09c1250e9630ced956d7c67c"')
    await queryRunner.query('DROP TABLE "quote_unit"')
  }
}
