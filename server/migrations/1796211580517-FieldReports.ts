import type { MigrationInterface, QueryRunner } from 'typeorm'

export class FieldReports1796211580517 implements MigrationInterface {
  name = 'FieldReports1796211580517'

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(
      'CREATE TABLE "field_report" ("id" integer PRIMARY KEY AUTOINCREMENT NOT NULL, "reporterId" integer, "reporterName" text NOT NULL, "status" text NOT NULL DEFAULT (\'submitted\'), "body" text NOT NULL, "warnings" text NOT NULL DEFAULT (\'[]\'), "decidedByName" text, "decidedAt" datetime, "decisionNote" text NOT NULL DEFAULT (\'\'), "createdAt" datetime NOT NULL DEFAULT (datetime(\'now\')))',
    )
    await queryRunner.query('CREATE INDEX "IDX_c761afe91c2c03170dab303134" ON "field_report" ("reporterId") ')
    await queryRunner.query('CREATE INDEX "IDX_1a4495852587a97930e4e20a09" ON "field_report" ("status", "id") ')
    await queryRunner.query(
      'CREATE TABLE "field_report_photo" ("id" integer PRIMARY KEY AUTOINCREMENT NOT NULL, "reportId" integer NOT NULL, "position" integer NOT NULL, "displayKey" text NOT NULL, "thumbKey" text NOT NULL, "width" integer NOT NULL, "height" integer NOT NULL)',
    )
    await queryRunner.query('CREATE INDEX "IDX_7f86b755dbd076bb94e3b6eeb4" ON "field_report_photo" ("reportId") ')
    await queryRunner.query('DROP INDEX "IDX_c761afe91c2c03170dab303134"')
    await queryRunner.query('DROP INDEX "IDX_1a4495852587a97930e4e20a09"')
    await queryRunner.query(
      'CREATE TABLE "temporary_field_report" ("id" integer PRIMARY KEY AUTOINCREMENT NOT NULL, "reporterId" integer, "reporterName" text NOT NULL, "status" text NOT NULL DEFAULT (\'submitted\'), "body" text NOT NULL, "warnings" text NOT NULL DEFAULT (\'[]\'), "decidedByName" text, "decidedAt" datetime, "decisionNote" text NOT NULL DEFAULT (\'\'), "createdAt" datetime NOT NULL DEFAULT (datetime(\'now\')), CONSTRAINT "FK_c761afe91c2c03170dab303134b" FOREIGN KEY ("reporterId") REFERENCES "user" ("id") ON DELETE SET NULL ON UPDATE NO ACTION)',
    )
    await queryRunner.query(
      'INSERT INTO "temporary_field_report"("id", "reporterId", "reporterName", "status", "body", "warnings", "decidedByName", "decidedAt", "decisionNote", "createdAt") SELECT "id", "reporterId", "reporterName", "status", "body", "warnings", "decidedByName", "decidedAt", "decisionNote", "createdAt" FROM "field_report"',
    )
    await queryRunner.query('DROP TABLE "field_report"')
    await queryRunner.query('ALTER TABLE "temporary_field_report" RENAME TO "field_report"')
    await queryRunner.query('CREATE INDEX "IDX_c761afe91c2c03170dab303134" ON "field_report" ("reporterId") ')
    await queryRunner.query('CREATE INDEX "IDX_1a4495852587a97930e4e20a09" ON "field_report" ("status", "id") ')
    await queryRunner.query('DROP INDEX "IDX_7f86b755dbd076bb94e3b6eeb4"')
    await queryRunner.query(
      'CREATE TABLE "temporary_field_report_photo" ("id" integer PRIMARY KEY AUTOINCREMENT NOT NULL, "reportId" integer NOT NULL, "position" integer NOT NULL, "displayKey" text NOT NULL, "thumbKey" text NOT NULL, "width" integer NOT NULL, "height" integer NOT NULL, CONSTRAINT "FK_7f86b755dbd076bb94e3b6eeb4d" FOREIGN KEY ("reportId") REFERENCES "field_report" ("id") ON DELETE CASCADE ON UPDATE NO ACTION)',
    )
    await queryRunner.query(
      'INSERT INTO "temporary_field_report_photo"("id", "reportId", "position", "displayKey", "thumbKey", "width", "height") SELECT "id", "reportId", "position", "displayKey", "thumbKey", "width", "height" FROM "field_report_photo"',
    )
    await queryRunner.query('DROP TABLE "field_report_photo"')
    await queryRunner.query('ALTER TABLE "temporary_field_report_photo" RENAME TO "field_report_photo"')
    await queryRunner.query('CREATE INDEX "IDX_7f86b755dbd076bb94e3b6eeb4" ON "field_report_photo" ("reportId") ')
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query('DROP INDEX "IDX_7f86b755dbd076bb94e3b6eeb4"')
    await queryRunner.query('ALTER TABLE "field_report_photo" RENAME TO "temporary_field_report_photo"')
    await queryRunner.query(
      'CREATE TABLE "field_report_photo" ("id" integer PRIMARY KEY AUTOINCREMENT NOT NULL, "reportId" integer NOT NULL, "position" integer NOT NULL, "displayKey" text NOT NULL, "thumbKey" text NOT NULL, "width" integer NOT NULL, "height" integer NOT NULL)',
    )
    await queryRunner.query(
      'INSERT INTO "field_report_photo"("id", "reportId", "position", "displayKey", "thumbKey", "width", "height") SELECT "id", "reportId", "position", "displayKey", "thumbKey", "width", "height" FROM "temporary_field_report_photo"',
    )
    await queryRunner.query('DROP TABLE "temporary_field_report_photo"')
    await queryRunner.query('CREATE INDEX "IDX_7f86b755dbd076bb94e3b6eeb4" ON "field_report_photo" ("reportId") ')
    await queryRunner.query('DROP INDEX "IDX_1a4495852587a97930e4e20a09"')
    await queryRunner.query('DROP INDEX "IDX_c761afe91c2c03170dab303134"')
    await queryRunner.query('ALTER TABLE "field_report" RENAME TO "temporary_field_report"')
    await queryRunner.query(
      'CREATE TABLE "field_report" ("id" integer PRIMARY KEY AUTOINCREMENT NOT NULL, "reporterId" integer, "reporterName" text NOT NULL, "status" text NOT NULL DEFAULT (\'submitted\'), "body" text NOT NULL, "warnings" text NOT NULL DEFAULT (\'[]\'), "decidedByName" text, "decidedAt" datetime, "decisionNote" text NOT NULL DEFAULT (\'\'), "createdAt" datetime NOT NULL DEFAULT (datetime(\'now\')))',
    )
    await queryRunner.query(
      'INSERT INTO "field_report"("id", "reporterId", "reporterName", "status", "body", "warnings", "decidedByName", "decidedAt", "decisionNote", "createdAt") SELECT "id", "reporterId", "reporterName", "status", "body", "warnings", "decidedByName", "decidedAt", "decisionNote", "createdAt" FROM "temporary_field_report"',
    )
    await queryRunner.query('DROP TABLE "temporary_field_report"')
    await queryRunner.query('CREATE INDEX "IDX_1a4495852587a97930e4e20a09" ON "field_report" ("status", "id") ')
    await queryRunner.query('CREATE INDEX "IDX_c761afe91c2c03170dab303134" ON "field_report" ("reporterId") ')
    await queryRunner.query('DROP INDEX "IDX_7f86b755dbd076bb94e3b6eeb4"')
    await queryRunner.query('DROP TABLE "field_report_photo"')
    await queryRunner.query('DROP INDEX "IDX_1a4495852587a97930e4e20a09"')
    await queryRunner.query('DROP INDEX "IDX_c761afe91c2c03170dab303134"')
    await queryRunner.query('DROP TABLE "field_report"')
  }
}
