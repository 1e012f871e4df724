import type { MigrationInterface, QueryRunner } from 'typeorm'

export class CsvImport1796154117731 implements MigrationInterface {
  name = 'CsvImport1796154117731'

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(
      'CREATE TABLE "import_batch" ("id" integer PRIMARY KEY AUTOINCREMENT NOT NULL, "type" text NOT NULL, "fileName" text NOT NULL, "fileHash" text NOT NULL, "userId" integer, "userName" text NOT NULL, "created" integer NOT NULL DEFAULT (0), "updated" integer NOT NULL DEFAULT (0), "unchanged" integer NOT NULL DEFAULT (0), "rejected" integer NOT NULL DEFAULT (0), "validRowsOnly" boolean NOT NULL DEFAULT (0), "status" text NOT NULL DEFAULT (\'committed\'), "revertedAt" datetime, "revertedByName" text, "createdAt" datetime NOT NULL DEFAULT (datetime(\'now\')))',
    )
    await queryRunner.query('CREATE INDEX "IDX_4eb048ac3cc8ea7b9bc4bd979d" ON "import_batch" ("status") ')
    await queryRunner.query(
      'CREATE TABLE "import_change" ("id" integer PRIMARY KEY AUTOINCREMENT NOT NULL, "batchId" integer NOT NULL, "recordType" text NOT NULL, "recordId" integer NOT NULL, "action" text NOT NULL, "previousBatchId" integer, "previousValues" text NOT NULL)',
    )
    await queryRunner.query('CREATE INDEX "IDX_e4701001339f15ebcfd426809e" ON "import_change" ("batchId") ')
    await queryRunner.query('CREATE INDEX "IDX_8a35f61c9b4bb15a371500420d" ON "import_change" ("previousBatchId") ')
    await queryRunner.query('DROP INDEX "IDX_a04370ac35038b3ae60e48868f"')
    await queryRunner.query('DROP INDEX "IDX_b8f82d97f1123fff02a8f9bf86"')
    await queryRunner.query('DROP INDEX "IDX_0e7d72b06bd86b591224e1ab93"')
    await queryRunner.query(
      'CREATE TABLE "temporary_part" ("id" integer PRIMARY KEY AUTOINCREMENT NOT NULL, "partNumber" text NOT NULL, "partKey" text NOT NULL, "kind" text NOT NULL, "name" text NOT NULL, "family" text NOT NULL DEFAULT (\'\'), "yearFrom" integer, "yearTo" integer, "notes" text NOT NULL DEFAULT (\'\'), "attributes" text NOT NULL, "createdAt" datetime NOT NULL DEFAULT (datetime(\'now\')), "updatedAt" datetime NOT NULL DEFAULT (datetime(\'now\')), "batchId" integer, CONSTRAINT "UQ_81b3dff0646d6190751b82cea87" UNIQUE ("partNumber"))',
    )
    await queryRunner.query(
      'INSERT INTO "temporary_part"("id", "partNumber", "partKey", "kind", "name", "family", "yearFrom", "yearTo", "notes", "attributes", "createdAt", "updatedAt") SELECT "id", "partNumber", "partKey", "kind", "name", "family", "yearFrom", "yearTo", "notes", "attributes", "createdAt", "updatedAt" FROM "part"',
    )
    await queryRunner.query('DROP TABLE "part"')
    await queryRunner.query('ALTER TABLE "temporary_part" RENAME TO "part"')
    await queryRunner.query('CREATE INDEX "IDX_a04370ac35038b3ae60e48868f" ON "part" ("family") ')
    await queryRunner.query('CREATE INDEX "IDX_b8f82d97f1123fff02a8f9bf86" ON "part" ("kind") ')
    await queryRunner.query('CREATE INDEX "IDX_0e7d72b06bd86b591224e1ab93" ON "part" ("partKey") ')
    await queryRunner.query(
      'CREATE TABLE "temporary_modification" ("id" integer PRIMARY KEY AUTOINCREMENT NOT NULL, "name" text NOT NULL, "title" text NOT NULL, "summary" text NOT NULL DEFAULT (\'\'), "steps" text NOT NULL, "extraParts" text NOT NULL, "consumables" text NOT NULL, "skillLevel" text NOT NULL DEFAULT (\'skilled\'), "timeMinutes" integer, "cautions" text NOT NULL, "status" text NOT NULL DEFAULT (\'approved\'), "source" text NOT NULL DEFAULT (\'editor\'), "createdAt" datetime NOT NULL DEFAULT (datetime(\'now\')), "updatedAt" datetime NOT NULL DEFAULT (datetime(\'now\')), "batchId" integer, CONSTRAINT "UQ_a83c62ad6f326e3befb0d666d8e" UNIQUE ("name"))',
    )
    await queryRunner.query(
      'INSERT INTO "temporary_modification"("id", "name", "title", "summary", "steps", "extraParts", "consumables", "skillLevel", "timeMinutes", "cautions", "status", "source", "createdAt", "updatedAt") SELECT "id", "name", "title", "summary", "steps", "extraParts", "consumables", "skillLevel", "timeMinutes", "cautions", "status", "source", "createdAt", "updatedAt" FROM "modification"',
    )
    await queryRunner.query('DROP TABLE "modification"')
    await queryRunner.query('ALTER TABLE "temporary_modification" RENAME TO "modification"')
    await queryRunner.query('CREATE INDEX "IDX_001d0a95bd9ebd39b1635a6567" ON "part" ("batchId") ')
    await queryRunner.query('CREATE INDEX "IDX_1b2bd76f348931f837ec2de455" ON "modification" ("batchId") ')
    await queryRunner.query('DROP INDEX "IDX_e4701001339f15ebcfd426809e"')
    await queryRunner.query('DROP INDEX "IDX_8a35f61c9b4bb15a371500420d"')
    await queryRunner.query(
      'CREATE TABLE "temporary_import_change" ("id" integer PRIMARY KEY AUTOINCREMENT NOT NULL, "batchId" integer NOT NULL, "recordType" text NOT NULL, "recordId" integer NOT NULL, "action" text NOT NULL, "previousBatchId" integer, "previousValues" text NOT NULL, CONSTRAINT "FK_e4701001339f15ebcfd426809e9" FOREIGN KEY ("batchId") REFERENCES "import_batch" ("id") ON DELETE CASCADE ON UPDATE NO ACTION)',
    )
    await queryRunner.query(
      'INSERT INTO "temporary_import_change"("id", "batchId", "recordType", "recordId", "action", "previousBatchId", "previousValues") SELECT "id", "batchId", "recordType", "recordId", "action", "previousBatchId", "previousValues" FROM "import_change"',
    )
    await queryRunner.query('DROP TABLE "import_change"')
    await queryRunner.query('ALTER TABLE "temporary_import_change" RENAME TO "import_change"')
    await queryRunner.query('CREATE INDEX "IDX_e4701001339f15ebcfd426809e" ON "import_change" ("batchId") ')
    await queryRunner.query('CREATE INDEX "IDX_8a35f61c9b4bb15a371500420d" ON "import_change" ("previousBatchId") ')
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query('DROP INDEX "IDX_8a35f61c9b4bb15a371500420d"')
    await queryRunner.query('DROP INDEX "IDX_e4701001339f15ebcfd426809e"')
    await queryRunner.query('ALTER TABLE "import_change" RENAME TO "temporary_import_change"')
    await queryRunner.query(
      'CREATE TABLE "import_change" ("id" integer PRIMARY KEY AUTOINCREMENT NOT NULL, "batchId" integer NOT NULL, "recordType" text NOT NULL, "recordId" integer NOT NULL, "action" text NOT NULL, "previousBatchId" integer, "previousValues" text NOT NULL)',
    )
    await queryRunner.query(
      'INSERT INTO "import_change"("id", "batchId", "recordType", "recordId", "action", "previousBatchId", "previousValues") SELECT "id", "batchId", "recordType", "recordId", "action", "previousBatchId", "previousValues" FROM "temporary_import_change"',
    )
    await queryRunner.query('DROP TABLE "temporary_import_change"')
    await queryRunner.query('CREATE INDEX "IDX_8a35f61c9b4bb15a371500420d" ON "import_change" ("previousBatchId") ')
    await queryRunner.query('CREATE INDEX "IDX_e4701001339f15ebcfd426809e" ON "import_change" ("batchId") ')
    await queryRunner.query('DROP INDEX "IDX_1b2bd76f348931f837ec2de455"')
    await queryRunner.query('DROP INDEX "IDX_001d0a95bd9ebd39b1635a6567"')
    await queryRunner.query('ALTER TABLE "modification" RENAME TO "temporary_modification"')
    await queryRunner.query(
      'CREATE TABLE "modification" ("id" integer PRIMARY KEY AUTOINCREMENT NOT NULL, "name" text NOT NULL, "title" text NOT NULL, "summary" text NOT NULL DEFAULT (\'\'), "steps" text NOT NULL, "extraParts" text NOT NULL, "consumables" text NOT NULL, "skillLevel" text NOT NULL DEFAULT (\'skilled\'), "timeMinutes" integer, "cautions" text NOT NULL, "status" text NOT NULL DEFAULT (\'approved\'), "source" text NOT NULL DEFAULT (\'editor\'), "createdAt" datetime NOT NULL DEFAULT (datetime(\'now\')), "updatedAt" datetime NOT NULL DEFAULT (datetime(\'now\')), CONSTRAINT "UQ_a83c62ad6f326e3befb0d666d8e" UNIQUE ("name"))',
    )
    await queryRunner.query(
      'INSERT INTO "modification"("id", "name", "title", "summary", "steps", "extraParts", "consumables", "skillLevel", "timeMinutes", "cautions", "status", "source", "createdAt", "updatedAt") SELECT "id", "name", "title", "summary", "steps", "extraParts", "consumables", "skillLevel", "timeMinutes", "cautions", "status", "source", "createdAt", "updatedAt" FROM "temporary_modification"',
    )
    await queryRunner.query('DROP TABLE "temporary_modification"')
    await queryRunner.query('DROP INDEX "IDX_0e7d72b06bd86b591224e1ab93"')
    await queryRunner.query('DROP INDEX "IDX_b8f82d97f1123fff02a8f9bf86"')
    await queryRunner.query('DROP INDEX "IDX_a04370ac35038b3ae60e48868f"')
    await queryRunner.query('ALTER TABLE "part" RENAME TO "temporary_part"')
    await queryRunner.query(
      'CREATE TABLE "part" ("id" integer PRIMARY KEY AUTOINCREMENT NOT NULL, "partNumber" text NOT NULL, "partKey" text NOT NULL, "kind" text NOT NULL, "name" text NOT NULL, "family" text NOT NULL DEFAULT (\'\'), "yearFrom" integer, "yearTo" integer, "notes" text NOT NULL DEFAULT (\'\'), "attributes" text NOT NULL, "createdAt" datetime NOT NULL DEFAULT (datetime(\'now\')), "updatedAt" datetime NOT NULL DEFAULT (datetime(\'now\')), CONSTRAINT "UQ_81b3dff0646d6190751b82cea87" UNIQUE ("partNumber"))',
    )
    await queryRunner.query(
      'INSERT INTO "part"("id", "partNumber", "partKey", "kind", "name", "family", "yearFrom", "yearTo", "notes", "attributes", "createdAt", "updatedAt") SELECT "id", "partNumber", "partKey", "kind", "name", "family", "yearFrom", "yearTo", "notes", "attributes", "createdAt", "updatedAt" FROM "temporary_part"',
    )
    await queryRunner.query('DROP TABLE "temporary_part"')
    await queryRunner.query('CREATE INDEX "IDX_0e7d72b06bd86b591224e1ab93" ON "part" ("partKey") ')
    await queryRunner.query('CREATE INDEX "IDX_b8f82d97f1123fff02a8f9bf86" ON "part" ("kind") ')
    await queryRunner.query('CREATE INDEX "IDX_a04370ac35038b3ae60e48868f" ON "part" ("family") ')
    await queryRunner.query('DROP INDEX "IDX_8a35f61c9b4bb15a371500420d"')
    await queryRunner.query('DROP INDEX "IDX_e4701001339f15ebcfd426809e"')
    await queryRunner.query('DROP TABLE "import_change"')
    await queryRunner.query('DROP INDEX "IDX_4eb048ac3cc8ea7b9bc4bd979d"')
    await queryRunner.query('DROP TABLE "import_batch"')
  }
}
