import type { MigrationInterface, QueryRunner } from 'typeorm'

export class Foundation1796150879975 implements MigrationInterface {
  name = 'Foundation1796150879975'

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query('CREATE TABLE "app_setting" ("key" text PRIMARY KEY NOT NULL, "value" text NOT NULL)')
    await queryRunner.query(
      'CREATE TABLE "part" ("id" integer PRIMARY KEY AUTOINCREMENT NOT NULL, "partNumber" text NOT NULL, "partKey" text NOT NULL, "kind" text NOT NULL, "name" text NOT NULL, "family" text NOT NULL DEFAULT (\'\'), "yearFrom" integer, "yearTo" integer, "notes" text NOT NULL DEFAULT (\'\'), "attributes" text NOT NULL, "createdAt" datetime NOT NULL DEFAULT (datetime(\'now\')), "updatedAt" datetime NOT NULL DEFAULT (datetime(\'now\')), CONSTRAINT "UQ_81b3dff0646d6190751b82cea87" UNIQUE ("partNumber"))',
    )
    await queryRunner.query('CREATE INDEX "IDX_0e7d72b06bd86b591224e1ab93" ON "part" ("partKey") ')
    await queryRunner.query('CREATE INDEX "IDX_b8f82d97f1123fff02a8f9bf86" ON "part" ("kind") ')
    await queryRunner.query('CREATE INDEX "IDX_a04370ac35038b3ae60e48868f" ON "part" ("family") ')
    await queryRunner.query(
      'CREATE TABLE "part_mark" ("id" integer PRIMARY KEY AUTOINCREMENT NOT NULL, "partId" integer NOT NULL, "type" text NOT NULL, "value" text NOT NULL, "valueKey" text NOT NULL)',
    )
    await queryRunner.query('CREATE INDEX "IDX_5b1f97c3c03d5547322fd4786d" ON "part_mark" ("valueKey") ')
    await queryRunner.query('CREATE UNIQUE INDEX "IDX_44cbecadcea4fc794ef990b721" ON "part_mark" ("partId", "type", "value") ')
    await queryRunner.query(
      'CREATE TABLE "session" ("expiredAt" bigint NOT NULL, "id" varchar(255) PRIMARY KEY NOT NULL, "json" text NOT NULL, "destroyedAt" datetime)',
    )
    await queryRunner.query('CREATE INDEX "IDX_28c5d1d16da7908c97c9bc2f74" ON "session" ("expiredAt") ')
    await queryRunner.query(
      'CREATE TABLE "user" ("id" integer PRIMARY KEY AUTOINCREMENT NOT NULL, "email" text NOT NULL, "name" text NOT NULL, "role" text NOT NULL, "passwordHash" text NOT NULL, "createdAt" datetime NOT NULL DEFAULT (datetime(\'now\')), CONSTRAINT "UQ_e12875dfb3b1d92d7d7c5377e22" UNIQUE ("email"))',
    )
    await queryRunner.query('DROP INDEX "IDX_5b1f97c3c03d5547322fd4786d"')
    await queryRunner.query('DROP INDEX "IDX_44cbecadcea4fc794ef990b721"')
    await queryRunner.query(
      'CREATE TABLE "temporary_part_mark" ("id" integer PRIMARY KEY AUTOINCREMENT NOT NULL, "partId" integer NOT NULL, "type" text NOT NULL, "value" text NOT NULL, "valueKey" text NOT NULL, CONSTRAINT "FK_98319f8fa1842a6b63223ef550c" FOREIGN KEY ("partId") REFERENCES "part" ("id") ON DELETE CASCADE ON UPDATE NO ACTION)',
    )
    await queryRunner.query(
      'INSERT INTO "temporary_part_mark"("id", "partId", "type", "value", "valueKey") SELECT "id", "partId", "type", "value", "valueKey" FROM "part_mark"',
    )
    await queryRunner.query('DROP TABLE "part_mark"')
    await queryRunner.query('ALTER TABLE "temporary_part_mark" RENAME TO "part_mark"')
    await queryRunner.query('CREATE INDEX "IDX_5b1f97c3c03d5547322fd4786d" ON "part_mark" ("valueKey") ')
    await queryRunner.query('CREATE UNIQUE INDEX "IDX_44cbecadcea4fc794ef990b721" ON "part_mark" ("partId", "type", "value") ')
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query('DROP INDEX "IDX_44cbecadcea4fc794ef990b721"')
    await queryRunner.query('DROP INDEX "IDX_5b1f97c3c03d5547322fd4786d"')
    await queryRunner.query('ALTER TABLE "part_mark" RENAME TO "temporary_part_mark"')
    await queryRunner.query(
      'CREATE TABLE "part_mark" ("id" integer PRIMARY KEY AUTOINCREMENT NOT NULL, "partId" integer NOT NULL, "type" text NOT NULL, "value" text NOT NULL, "valueKey" text NOT NULL)',
    )
    await queryRunner.query(
      'INSERT INTO "part_mark"("id", "partId", "type", "value", "valueKey") SELECT "id", "partId", "type", "value", "valueKey" FROM "temporary_part_mark"',
    )
    await queryRunner.query('DROP TABLE "temporary_part_mark"')
    await queryRunner.query('CREATE UNIQUE INDEX "IDX_44cbecadcea4fc794ef990b721" ON "part_mark" ("partId", "type", "value") ')
    await queryRunner.query('CREATE INDEX "IDX_5b1f97c3c03d5547322fd4786d" ON "part_mark" ("valueKey") ')
    await queryRunner.query('DROP TABLE "user"')
    await queryRunner.query('DROP INDEX "IDX_28c5d1d16da7908c97c9bc2f74"')
    await queryRunner.query('DROP TABLE "session"')
    await queryRunner.query('DROP INDEX "IDX_44cbecadcea4fc794ef990b721"')
    await queryRunner.query('DROP INDEX "IDX_5b1f97c3c03d5547322fd4786d"')
    await queryRunner.query('DROP TABLE "part_mark"')
    await queryRunner.query('DROP INDEX "IDX_a04370ac35038b3ae60e48868f"')
    await queryRunner.query('DROP INDEX "IDX_b8f82d97f1123fff02a8f9bf86"')
    await queryRunner.query('DROP INDEX "IDX_0e7d72b06bd86b591224e1ab93"')
    await queryRunner.query('DROP TABLE "part"')
    await queryRunner.query('DROP TABLE "app_setting"')
  }
}
