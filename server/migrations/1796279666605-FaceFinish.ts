import type { MigrationInterface, QueryRunner } from 'typeorm'

export class FaceFinish1796279666605 implements MigrationInterface {
  name = 'FaceFinish1796279666605'

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query('DROP INDEX "IDX_540bb6362dd999a52e5d10b993"')
    await queryRunner.query(
      'CREATE TABLE "temporary_build_sheet" ("id" integer PRIMARY KEY AUTOINCREMENT NOT NULL, "ownerId" integer NOT NULL, "name" text NOT NULL, "slots" text NOT NULL, "targetPowerKw" real, "fuelOctane" real, "chassisModelYear" integer, "vin" text, "notes" text NOT NULL DEFAULT (\'\'), "createdAt" datetime NOT NULL DEFAULT (datetime(\'now\')), "updatedAt" datetime NOT NULL DEFAULT (datetime(\'now\')), "checklist" text NOT NULL DEFAULT (\'{}\'), "savedVerdict" text, "labourMinutes" integer, "vehicleId" integer, "faceFinish" text, CONSTRAINT "FK_540bb6362dd999a52e5d10b9938" FOREIGN KEY ("ownerId") REFERENCES "user" ("id") ON DELETE CASCADE ON UPDATE NO ACTION)',
    )
    await queryRunner.query(
      'INSERT INTO "temporary_build_sheet"("id", "ownerId", "name", "slots", "targetPowerKw", "fuelOctane", "chassisModelYear", "vin", "notes", "createdAt", "updatedAt", "checklist", "savedVerdict", "labourMinutes", "vehicleId") SELECT "id", "ownerId", "name", "slots", "targetPowerKw", "fuelOctane", "chassisModelYear", "vin", "notes", "createdAt", "updatedAt", "checklist", "savedVerdict", "labourMinutes", "vehicleId" FROM "build_sheet"',
    )
    await queryRunner.query('DROP TABLE "build_sheet"')
    await queryRunner.query('ALTER TABLE "temporary_build_sheet" RENAME TO "build_sheet"')
    await queryRunner.query('CREATE INDEX "IDX_540bb6362dd999a52e5d10b993" ON "build_sheet" ("ownerId") ')
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query('DROP INDEX "IDX_540bb6362dd999a52e5d10b993"')
    await queryRunner.query('ALTER TABLE "build_sheet" RENAME TO "temporary_build_sheet"')
    await queryRunner.query(
      'CREATE TABLE "build_sheet" ("id" integer PRIMARY KEY AUTOINCREMENT NOT NULL, "ownerId" integer NOT NULL, "name" text NOT NULL, "slots" text NOT NULL, "targetPowerKw" real, "fuelOctane" real, "chassisModelYear" integer, "vin" text, "notes" text NOT NULL DEFAULT (\'\'), "createdAt" datetime NOT NULL DEFAULT (datetime(\'now\')), "updatedAt" datetime NOT NULL DEFAULT (datetime(\'now\')), "checklist" text NOT NULL DEFAULT (\'{}\'), "savedVerdict" text, "labourMinutes" integer, "vehicleId" integer, CONSTRAINT "FK_540bb6362dd999a52e5d10b9938" FOREIGN KEY ("ownerId") REFERENCES "user" ("id") ON DELETE CASCADE ON UPDATE NO ACTION)',
    )
    await queryRunner.query(
      'INSERT INTO "build_sheet"("id", "ownerId", "name", "slots", "targetPowerKw", "fuelOctane", "chassisModelYear", "vin", "notes", "createdAt", "updatedAt", "checklist", "savedVerdict", "labourMinutes", "vehicleId") SELECT "id", "ownerId", "name", "slots", "targetPowerKw", "fuelOctane", "chassisModelYear", "vin", "notes", "createdAt", "updatedAt", "checklist", "savedVerdict", "labourMinutes", "vehicleId" FROM "temporary_build_sheet"',
    )
    await queryRunner.query('DROP TABLE "temporary_build_sheet"')
    await queryRunner.query('CREATE INDEX "IDX_540bb6362dd999a52e5d10b993" ON "build_sheet" ("ownerId") ')
  }
}
