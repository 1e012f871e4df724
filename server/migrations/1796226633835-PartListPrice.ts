import type { MigrationInterface, QueryRunner } from 'typeorm'

export class PartListPrice1796226633835 implements MigrationInterface {
  name = 'PartListPrice1796226633835'

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query('DROP INDEX "IDX_001d0a95bd9ebd39b1635a6567"')
    await queryRunner.query('DROP INDEX "IDX_0e7d72b06bd86b591224e1ab93"')
    await queryRunner.query('DROP INDEX "IDX_b8f82d97f1123fff02a8f9bf86"')
    await queryRunner.query('DROP INDEX "IDX_a04370ac35038b3ae60e48868f"')
    await queryRunner.query(
      'CREATE TABLE "temporary_part" ("id" integer PRIMARY KEY AUTOINCREMENT NOT NULL, "partNumber" text NOT NULL, "partKey" text NOT NULL, "kind" text NOT NULL, "name" text NOT NULL, "family" text NOT NULL DEFAULT (\'\'), "yearFrom" integer, "yearTo" integer, "notes" text NOT NULL DEFAULT (\'\'), "attributes" text NOT NULL, "createdAt" datetime NOT NULL DEFAULT (datetime(\'now\')), "updatedAt" datetime NOT NULL DEFAULT (datetime(\'now\')), "batchId" integer, "listPriceCents" integer, CONSTRAINT "UQ_81b3dff0646d6190751b82cea87" UNIQUE ("partNumber"))',
    )
    await queryRunner.query(
      'INSERT INTO "temporary_part"("id", "partNumber", "partKey", "kind", "name", "family", "yearFrom", "yearTo", "notes", "attributes", "createdAt", "updatedAt", "batchId") SELECT "id", "partNumber", "partKey", "kind", "name", "family", "yearFrom", "yearTo", "notes", "attributes", "createdAt", "updatedAt", "batchId" FROM "part"',
    )
    await queryRunner.query('DROP TABLE "part"')
    await queryRunner.query('ALTER TABLE "temporary_part" RENAME TO "part"')
    await queryRunner.query('CREATE INDEX "IDX_001d0a95bd9ebd39b1635a6567" ON "part" ("batchId") ')
    await queryRunner.query('CREATE INDEX "IDX_0e7d72b06bd86b591224e1ab93" ON "part" ("partKey") ')
    await queryRunner.query('CREATE INDEX "IDX_b8f82d97f1123fff02a8f9bf86" ON "part" ("kind") ')
    await queryRunner.query('CREATE INDEX "IDX_a04370ac35038b3ae60e48868f" ON "part" ("family") ')
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query('DROP INDEX "IDX_a04370ac35038b3ae60e48868f"')
    await queryRunner.query('DROP INDEX "IDX_b8f82d97f1123fff02a8f9bf86"')
    await queryRunner.query('DROP INDEX "IDX_0e7d72b06bd86b591224e1ab93"')
    await queryRunner.query('DROP INDEX "IDX_001d0a95bd9ebd39b1635a6567"')
    await queryRunner.query('ALTER TABLE "part" RENAME TO "temporary_part"')
    await queryRunner.query(
      'CREATE TABLE "part" ("id" integer PRIMARY KEY AUTOINCREMENT NOT NULL, "partNumber" text NOT NULL, "partKey" text NOT NULL, "kind" text NOT NULL, "name" text NOT NULL, "family" text NOT NULL DEFAULT (\'\'), "yearFrom" integer, "yearTo" integer, "notes" text NOT NULL DEFAULT (\'\'), "attributes" text NOT NULL, "createdAt" datetime NOT NULL DEFAULT (datetime(\'now\')), "updatedAt" datetime NOT NULL DEFAULT (datetime(\'now\')), "batchId" integer, CONSTRAINT "UQ_81b3dff0646d6190751b82cea87" UNIQUE ("partNumber"))',
    )
    await queryRunner.query(
      'INSERT INTO "part"("id", "partNumber", "partKey", "kind", "name", "family", "yearFrom", "yearTo", "notes", "attributes", "createdAt", "updatedAt", "batchId") SELECT "id", "partNumber", "partKey", "kind", "name", "family", "yearFrom", "yearTo", "notes", "attributes", "createdAt", "updatedAt", "batchId" FROM "temporary_part"',
    )
    await queryRunner.query('DROP TABLE "temporary_part"')
    await queryRunner.query('CREATE INDEX "IDX_a04370ac35038b3ae60e48868f" ON "part" ("family") ')
    await queryRunner.query('CREATE INDEX "IDX_b8f82d97f1123fff02a8f9bf86" ON "part" ("kind") ')
    await queryRunner.query('CREATE INDEX "IDX_0e7d72b06bd86b591224e1ab93" ON "part" ("partKey") ')
    await queryRunner.query('CREATE INDEX "IDX_001d0a95bd9ebd39b1635a6567" ON "part" ("batchId") ')
  }
}
