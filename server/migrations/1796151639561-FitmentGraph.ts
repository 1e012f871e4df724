import type { MigrationInterface, QueryRunner } from 'typeorm'

export class FitmentGraph1796151639561 implements MigrationInterface {
  name = 'FitmentGraph1796151639561'

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(
      'CREATE TABLE "build_sheet" ("id" integer PRIMARY KEY AUTOINCREMENT NOT NULL, "ownerId" integer NOT NULL, "name" text NOT NULL, "slots" text NOT NULL, "targetPowerKw" real, "fuelOctane" real, "chassisModelYear" integer, "vin" text, "notes" text NOT NULL DEFAULT (\'\'), "createdAt" datetime NOT NULL DEFAULT (datetime(\'now\')), "updatedAt" datetime NOT NULL DEFAULT (datetime(\'now\')))',
    )
    await queryRunner.query('CREATE INDEX "IDX_540bb6362dd999a52e5d10b993" ON "build_sheet" ("ownerId") ')
    await queryRunner.query(
      'CREATE TABLE "part_identity" ("id" integer PRIMARY KEY AUTOINCREMENT NOT NULL, "partAId" integer NOT NULL, "partBId" integer NOT NULL, "note" text NOT NULL DEFAULT (\'\'), "source" text NOT NULL, "batchId" integer, "createdAt" datetime NOT NULL DEFAULT (datetime(\'now\')), CONSTRAINT "CHK_e37e2f034911d3b7469ef42050" CHECK ("partAId" < "partBId"))',
    )
    await queryRunner.query('CREATE INDEX "IDX_42534bfd9591f74712d8b8b3aa" ON "part_identity" ("partBId") ')
    await queryRunner.query('CREATE INDEX "IDX_05ccda2089f43c89c46f993230" ON "part_identity" ("batchId") ')
    await queryRunner.query('CREATE UNIQUE INDEX "IDX_998ce2b7a2198109237a14f5fc" ON "part_identity" ("partAId", "partBId") ')
    await queryRunner.query(
      'CREATE TABLE "modification" ("id" integer PRIMARY KEY AUTOINCREMENT NOT NULL, "name" text NOT NULL, "title" text NOT NULL, "summary" text NOT NULL DEFAULT (\'\'), "steps" text NOT NULL, "extraParts" text NOT NULL, "consumables" text NOT NULL, "skillLevel" text NOT NULL DEFAULT (\'skilled\'), "timeMinutes" integer, "cautions" text NOT NULL, "status" text NOT NULL DEFAULT (\'approved\'), "source" text NOT NULL DEFAULT (\'editor\'), "createdAt" datetime NOT NULL DEFAULT (datetime(\'now\')), "updatedAt" datetime NOT NULL DEFAULT (datetime(\'now\')), CONSTRAINT "UQ_a83c62ad6f326e3befb0d666d8e" UNIQUE ("name"))',
    )
    await queryRunner.query(
      'CREATE TABLE "link" ("id" integer PRIMARY KEY AUTOINCREMENT NOT NULL, "partAId" integer NOT NULL, "partBId" integer NOT NULL, "relation" text NOT NULL, "note" text NOT NULL DEFAULT (\'\'), "source" text NOT NULL, "batchId" integer, "status" text NOT NULL DEFAULT (\'approved\'), "createdAt" datetime NOT NULL DEFAULT (datetime(\'now\')), "updatedAt" datetime NOT NULL DEFAULT (datetime(\'now\')), CONSTRAINT "CHK_ef39ba5a45945e4fd0a69e4933" CHECK ("partAId" < "partBId"))',
    )
    await queryRunner.query('CREATE INDEX "IDX_e6d0e76ec9e40e16f8b992c1d9" ON "link" ("partBId") ')
    await queryRunner.query('CREATE INDEX "IDX_c065da8a27052f5ec67b417334" ON "link" ("batchId") ')
    await queryRunner.query('CREATE INDEX "IDX_53afda4c99a26dae97a8c0248e" ON "link" ("status") ')
    await queryRunner.query('CREATE UNIQUE INDEX "IDX_fce1a71e316230e96a57e009c2" ON "link" ("partAId", "partBId") ')
    await queryRunner.query(
      'CREATE TABLE "link_modification" ("linkId" integer NOT NULL, "modificationId" integer NOT NULL, PRIMARY KEY ("linkId", "modificationId"))',
    )
    await queryRunner.query('CREATE INDEX "IDX_4504a2da59cdd9886187657802" ON "link_modification" ("linkId") ')
    await queryRunner.query('CREATE INDEX "IDX_62736e7d3c5097bd7a4c11ec11" ON "link_modification" ("modificationId") ')
    await queryRunner.query('DROP INDEX "IDX_540bb6362dd999a52e5d10b993"')
    await queryRunner.query(
      'CREATE TABLE "temporary_build_sheet" ("id" integer PRIMARY KEY AUTOINCREMENT NOT NULL, "ownerId" integer NOT NULL, "name" text NOT NULL, "slots" text NOT NULL, "targetPowerKw" real, "fuelOctane" real, "chassisModelYear" integer, "vin" text, "notes" text NOT NULL DEFAULT (\'\'), "createdAt" datetime NOT NULL DEFAULT (datetime(\'now\')), "updatedAt" datetime NOT NULL DEFAULT (datetime(\'now\')), CONSTRAINT "FK_540bb6362dd999a52e5d10b9938" FOREIGN KEY ("ownerId") REFERENCES "user" ("id") ON DELETE CASCADE ON UPDATE NO ACTION)',
    )
    await queryRunner.query(
      'INSERT INTO "temporary_build_sheet"("id", "ownerId", "name", "slots", "targetPowerKw", "fuelOctane", "chassisModelYear", "vin", "notes", "createdAt", "updatedAt") SELECT "id", "ownerId", "name", "slots", "targetPowerKw", "fuelOctane", "chassisModelYear", "vin", "notes", "createdAt", "updatedAt" FROM "build_sheet"',
    )
    await queryRunner.query('DROP TABLE "build_sheet"')
    await queryRunner.query('ALTER TABLE "temporary_build_sheet" RENAME TO "build_sheet"')
    await queryRunner.query('CREATE INDEX "IDX_540bb6362dd999a52e5d10b993" ON "build_sheet" ("ownerId") ')
    await queryRunner.query('DROP INDEX "IDX_42534bfd9591f74712d8b8b3aa"')
    await queryRunner.query('DROP INDEX "IDX_05ccda2089f43c89c46f993230"')
    await queryRunner.query('DROP INDEX "IDX_998ce2b7a2198109237a14f5fc"')
    await queryRunner.query(
      'CREATE TABLE "temporary_part_identity" ("id" integer PRIMARY KEY AUTOINCREMENT NOT NULL, "partAId" integer NOT NULL, "partBId" integer NOT NULL, "note" text NOT NULL DEFAULT (\'\'), "source" text NOT NULL, "batchId" integer, "createdAt" datetime NOT NULL DEFAULT (datetime(\'now\')), CONSTRAINT "CHK_e37e2f034911d3b7469ef42050" CHECK ("partAId" < "partBId"), CONSTRAINT "FK_161b8acec8dd46a9366c9e344f7" FOREIGN KEY ("partAId") REFERENCES "part" ("id") ON DELETE CASCADE ON UPDATE NO ACTION, CONSTRAINT "FK_42534bfd9591f74712d8b8b3aad" FOREIGN KEY ("partBId") REFERENCES "part" ("id") ON DELETE CASCADE ON UPDATE NO ACTION)',
    )
    await queryRunner.query(
      'INSERT INTO "temporary_part_identity"("id", "partAId", "partBId", "note", "source", "batchId", "createdAt") SELECT "id", "partAId", "partBId", "note", "source", "batchId", "createdAt" FROM "part_identity"',
    )
    await queryRunner.query('DROP TABLE "part_identity"')
    await queryRunner.query('ALTER TABLE "temporary_part_identity" RENAME TO "part_identity"')
    await queryRunner.query('CREATE INDEX "IDX_42534bfd9591f74712d8b8b3aa" ON "part_identity" ("partBId") ')
    await queryRunner.query('CREATE INDEX "IDX_05ccda2089f43c89c46f993230" ON "part_identity" ("batchId") ')
    await queryRunner.query('CREATE UNIQUE INDEX "IDX_998ce2b7a2198109237a14f5fc" ON "part_identity" ("partAId", "partBId") ')
    await queryRunner.query('DROP INDEX "IDX_e6d0e76ec9e40e16f8b992c1d9"')
    await queryRunner.query('DROP INDEX "IDX_c065da8a27052f5ec67b417334"')
    await queryRunner.query('DROP INDEX "IDX_53afda4c99a26dae97a8c0248e"')
    await queryRunner.query('DROP INDEX "IDX_fce1a71e316230e96a57e009c2"')
    await queryRunner.query(
      'CREATE TABLE "temporary_link" ("id" integer PRIMARY KEY AUTOINCREMENT NOT NULL, "partAId" integer NOT NULL, "partBId" integer NOT NULL, "relation" text NOT NULL, "note" text NOT NULL DEFAULT (\'\'), "source" text NOT NULL, "batchId" integer, "status" text NOT NULL DEFAULT (\'approved\'), "createdAt" datetime NOT NULL DEFAULT (datetime(\'now\')), "updatedAt" datetime NOT NULL DEFAULT (datetime(\'now\')), CONSTRAINT "CHK_ef39ba5a45945e4fd0a69e4933" CHECK ("partAId" < "partBId"), CONSTRAINT "FK_dca46d8fa93a54d15ed6be4bdb8" FOREIGN KEY ("partAId") REFERENCES "part" ("id") ON DELETE CASCADE ON UPDATE NO ACTION, CONSTRAINT "FK_e6d0e76ec9e40e16f8b992c1d9b" FOREIGN KEY ("partBId") REFERENCES "part" ("id") ON DELETE CASCADE ON UPDATE NO ACTION)',
    )
    await queryRunner.query(
      'INSERT INTO "temporary_link"("id", "partAId", "partBId", "relation", "note", "source", "batchId", "status", "createdAt", "updatedAt") SELECT "id", "partAId", "partBId", "relation", "note", "source", "batchId", "status", "createdAt", "updatedAt" FROM "link"',
    )
    await queryRunner.query('DROP TABLE "link"')
    await queryRunner.query('ALTER TABLE "temporary_link" RENAME TO "link"')
    await queryRunner.query('CREATE INDEX "IDX_e6d0e76ec9e40e16f8b992c1d9" ON "link" ("partBId") ')
    await queryRunner.query('CREATE INDEX "IDX_c065da8a27052f5ec67b417334" ON "link" ("batchId") ')
    await queryRunner.query('CREATE INDEX "IDX_53afda4c99a26dae97a8c0248e" ON "link" ("status") ')
    await queryRunner.query('CREATE UNIQUE INDEX "IDX_fce1a71e316230e96a57e009c2" ON "link" ("partAId", "partBId") ')
    await queryRunner.query('DROP INDEX "IDX_4504a2da59cdd9886187657802"')
    await queryRunner.query('DROP INDEX "IDX_62736e7d3c5097bd7a4c11ec11"')
    await queryRunner.query(
      'CREATE TABLE "temporary_link_modification" ("linkId" integer NOT NULL, "modificationId" integer NOT NULL, CONSTRAINT "FK_4504a2da59cdd98861876578020" FOREIGN KEY ("linkId") REFERENCES "link" ("id") ON DELETE CASCADE ON UPDATE CASCADE, CONSTRAINT "FK_62736e7d3c5097bd7a4c11ec11f" FOREIGN KEY ("modificationId") REFERENCES "modification" ("id") ON DELETE CASCADE ON UPDATE CASCADE, PRIMARY KEY ("linkId", "modificationId"))',
    )
    await queryRunner.query(
      'INSERT INTO "temporary_link_modification"("linkId", "modificationId") SELECT "linkId", "modificationId" FROM "link_modification"',
    )
    await queryRunner.query('DROP TABLE "link_modification"')
    await queryRunner.query('ALTER TABLE "temporary_link_modification" RENAME TO "link_modification"')
    await queryRunner.query('CREATE INDEX "IDX_4504a2da59cdd9886187657802" ON "link_modification" ("linkId") ')
    await queryRunner.query('CREATE INDEX "IDX_62736e7d3c5097bd7a4c11ec11" ON "link_modification" ("modificationId") ')
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query('DROP INDEX "IDX_62736e7d3c5097bd7a4c11ec11"')
    await queryRunner.query('DROP INDEX "IDX_4504a2da59cdd9886187657802"')
    await queryRunner.query('ALTER TABLE "link_modification" RENAME TO "temporary_link_modification"')
    await queryRunner.query(
      'CREATE TABLE "link_modification" ("linkId" integer NOT NULL, "modificationId" integer NOT NULL, PRIMARY KEY ("linkId", "modificationId"))',
    )
    await queryRunner.query(
      'INSERT INTO "link_modification"("linkId", "modificationId") SELECT "linkId", "modificationId" FROM "temporary_link_modification"',
    )
    await queryRunner.query('DROP TABLE "temporary_link_modification"')
    await queryRunner.query('CREATE INDEX "IDX_62736e7d3c5097bd7a4c11ec11" ON "link_modification" ("modificationId") ')
    await queryRunner.query('CREATE INDEX "IDX_4504a2da59cdd9886187657802" ON "link_modification" ("linkId") ')
    await queryRunner.query('DROP INDEX "IDX_fce1a71e316230e96a57e009c2"')
    await queryRunner.query('DROP INDEX "IDX_53afda4c99a26dae97a8c0248e"')
    await queryRunner.query('DROP INDEX "IDX_c065da8a27052f5ec67b417334"')
    await queryRunner.query('DROP INDEX "IDX_e6d0e76ec9e40e16f8b992c1d9"')
    await queryRunner.query('ALTER TABLE "link" RENAME TO "temporary_link"')
    await queryRunner.query(
      'CREATE TABLE "link" ("id" integer PRIMARY KEY AUTOINCREMENT NOT NULL, "partAId" integer NOT NULL, "partBId" integer NOT NULL, "relation" text NOT NULL, "note" text NOT NULL DEFAULT (\'\'), "source" text NOT NULL, "batchId" integer, "status" text NOT NULL DEFAULT (\'approved\'), "createdAt" datetime NOT NULL DEFAULT (datetime(\'now\')), "updatedAt" datetime NOT NULL DEFAULT (datetime(\'now\')), CONSTRAINT "CHK_ef39ba5a45945e4fd0a69e4933" CHECK ("partAId" < "partBId"))',
    )
    await queryRunner.query(
      'INSERT INTO "link"("id", "partAId", "partBId", "relation", "note", "source", "batchId", "status", "createdAt", "updatedAt") SELECT "id", "partAId", "partBId", "relation", "note", "source", "batchId", "status", "createdAt", "updatedAt" FROM "temporary_link"',
    )
    await queryRunner.query('DROP TABLE "temporary_link"')
    await queryRunner.query('CREATE UNIQUE INDEX "IDX_fce1a71e316230e96a57e009c2" ON "link" ("partAId", "partBId") ')
    await queryRunner.query('CREATE INDEX "IDX_53afda4c99a26dae97a8c0248e" ON "link" ("status") ')
    await queryRunner.query('CREATE INDEX "IDX_c065da8a27052f5ec67b417334" ON "link" ("batchId") ')
    await queryRunner.query('CREATE INDEX "IDX_e6d0e76ec9e40e16f8b992c1d9" ON "link" ("partBId") ')
    await queryRunner.query('DROP INDEX "IDX_998ce2b7a2198109237a14f5fc"')
    await queryRunner.query('DROP INDEX "IDX_05ccda2089f43c89c46f993230"')
    await queryRunner.query('DROP INDEX "IDX_42534bfd9591f74712d8b8b3aa"')
    await queryRunner.query('ALTER TABLE "part_identity" RENAME TO "temporary_part_identity"')
    await queryRunner.query(
      'CREATE TABLE "part_identity" ("id" integer PRIMARY KEY AUTOINCREMENT NOT NULL, "partAId" integer NOT NULL, "partBId" integer NOT NULL, "note" text NOT NULL DEFAULT (\'\'), "source" text NOT NULL, "batchId" integer, "createdAt" datetime NOT NULL DEFAULT (datetime(\'now\')), CONSTRAINT "CHK_e37e2f034911d3b7469ef42050" CHECK ("partAId" < "partBId"))',
    )
    await queryRunner.query(
      'INSERT INTO "part_identity"("id", "partAId", "partBId", "note", "source", "batchId", "createdAt") SELECT "id", "partAId", "partBId", "note", "source", "batchId", "createdAt" FROM "temporary_part_identity"',
    )
    await queryRunner.query('DROP TABLE "temporary_part_identity"')
    await queryRunner.query('CREATE UNIQUE INDEX "IDX_998ce2b7a2198109237a14f5fc" ON "part_identity" ("partAId", "partBId") ')
    await queryRunner.query('CREATE INDEX "IDX_05ccda2089f43c89c46f993230" ON "part_identity" ("batchId") ')
    await queryRunner.query('CREATE INDEX "IDX_42534bfd9591f74712d8b8b3aa" ON "part_identity" ("partBId") ')
    await queryRunner.query('DROP INDEX "IDX_540bb6362dd999a52e5d10b993"')
    await queryRunner.query('ALTER TABLE "build_sheet" RENAME TO "temporary_build_sheet"')
    await queryRunner.query(
      'CREATE TABLE "build_sheet" ("id" integer PRIMARY KEY AUTOINCREMENT NOT NULL, "ownerId" integer NOT NULL, "name" text NOT NULL, "slots" text NOT NULL, "targetPowerKw" real, "fuelOctane" real, "chassisModelYear" integer, "vin" text, "notes" text NOT NULL DEFAULT (\'\'), "createdAt" datetime NOT NULL DEFAULT (datetime(\'now\')), "updatedAt" datetime NOT NULL DEFAULT (datetime(\'now\')))',
    )
    await queryRunner.query(
      'INSERT INTO "build_sheet"("id", "ownerId", "name", "slots", "targetPowerKw", "fuelOctane", "chassisModelYear", "vin", "notes", "createdAt", "updatedAt") SELECT "id", "ownerId", "name", "slots", "targetPowerKw", "fuelOctane", "chassisModelYear", "vin", "notes", "createdAt", "updatedAt" FROM "temporary_build_sheet"',
    )
    await queryRunner.query('DROP TABLE "temporary_build_sheet"')
    await queryRunner.query('CREATE INDEX "IDX_540bb6362dd999a52e5d10b993" ON "build_sheet" ("ownerId") ')
    await queryRunner.query('DROP INDEX "IDX_62736e7d3c5097bd7a4c11ec11"')
    await queryRunner.query('DROP INDEX "IDX_4504a2da59cdd9886187657802"')
    await queryRunner.query('DROP TABLE "link_modification"')
    await queryRunner.query('DROP INDEX "IDX_fce1a71e316230e96a57e009c2"')
    await queryRunner.query('DROP INDEX "IDX_53afda4c99a26dae97a8c0248e"')
    await queryRunner.query('DROP INDEX "IDX_c065da8a27052f5ec67b417334"')
    await queryRunner.query('DROP INDEX "IDX_e6d0e76ec9e40e16f8b992c1d9"')
    await queryRunner.query('DROP TABLE "link"')
    await queryRunner.query('DROP TABLE "modification"')
    await queryRunner.query('DROP INDEX "IDX_998ce2b7a2198109237a14f5fc"')
    await queryRunner.query('DROP INDEX "IDX_05ccda2089f43c89c46f993230"')
    await queryRunner.query('DROP INDEX "IDX_42534bfd9591f74712d8b8b3aa"')
    await queryRunner.query('DROP TABLE "part_identity"')
    await queryRunner.query('DROP INDEX "IDX_540bb6362dd999a52e5d10b993"')
    await queryRunner.query('DROP TABLE "build_sheet"')
  }
}
