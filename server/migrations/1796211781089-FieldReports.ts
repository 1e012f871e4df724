import type { MigrationInterface, QueryRunner } from 'typeorm'

export class FieldReports1796211781089 implements MigrationInterface {
  name = 'FieldReports1796211781089'

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(
      'CREATE TABLE "field_report" ("id" integer PRIMARY KEY AUTOINCREMENT NOT NULL, "reporterId" integer, "reporterName" text NOT NULL, "status" text NOT NULL DEFAULT (\'submitted\'), "body" text NOT NULL, "warnings" text NOT NULL DEFAULT (\'[]\'), "decidedByName" text, "decidedAt" datetime, "decisionNote" text NOT NULL DEFAULT (\'\'), "batchId" integer, "createdAt" datetime NOT NULL DEFAULT (datetime(\'now\')))',
    )
    await queryRunner.query('CREATE INDEX "IDX_c761afe91c2c03170dab303134" ON "field_report" ("reporterId") ')
    await queryRunner.query('CREATE INDEX "IDX_1a4495852587a97930e4e20a09" ON "field_report" ("status", "id") ')
    await queryRunner.query(
      'CREATE TABLE "field_report_photo" ("id" integer PRIMARY KEY AUTOINCREMENT NOT NULL, "reportId" integer NOT NULL, "position" integer NOT NULL, "displayKey" text NOT NULL, "thumbKey" text NOT NULL, "width" integer NOT NULL, "height" integer NOT NULL)',
    )
    await queryRunner.query('CREATE INDEX "IDX_7f86b755dbd076bb94e3b6eeb4" ON "field_report_photo" ("reportId") ')
    await queryRunner.query(
      'CREATE TABLE "field_report_link" ("id" integer PRIMARY KEY AUTOINCREMENT NOT NULL, "reportId" integer NOT NULL, "linkId" integer NOT NULL, "batchId" integer NOT NULL, "agrees" integer NOT NULL)',
    )
    await queryRunner.query('CREATE INDEX "IDX_99cda8b55e108fe2fa05a28f17" ON "field_report_link" ("linkId") ')
    await queryRunner.query('CREATE INDEX "IDX_402243837319f816db34938d78" ON "field_report_link" ("batchId") ')
    await queryRunner.query('CREATE UNIQUE INDEX "IDX_5268c41580d672bd775340ff9c" ON "field_report_link" ("reportId", "linkId") ')
    await queryRunner.query('DROP INDEX "IDX_c761afe91c2c03170dab303134"')
    await queryRunner.query('DROP INDEX "IDX_1a4495852587a97930e4e20a09"')
    await queryRunner.query(
      'CREATE TABLE "temporary_field_report" ("id" integer PRIMARY KEY AUTOINCREMENT NOT NULL, "reporterId" integer, "reporterName" text NOT NULL, "status" text NOT NULL DEFAULT (\'submitted\'), "body" text NOT NULL, "warnings" text NOT NULL DEFAULT (\'[]\'), "decidedByName" text, "decidedAt" datetime, "decisionNote" text NOT NULL DEFAULT (\'\'), "batchId" integer, "createdAt" datetime NOT NULL DEFAULT (datetime(\'now\')), CONSTRAINT "FK_c761afe91c2c03170dab303134b" FOREIGN KEY ("reporterId") REFERENCES "user" ("id") ON DELETE SET NULL ON UPDATE NO ACTION)',
    )
    await queryRunner.query(
      'INSERT INTO "temporary_field_report"("id", "reporterId", "reporterName", "status", "body", "warnings", "decidedByName", "decidedAt", "decisionNote", "batchId", "createdAt") SELECT "id", "reporterId", "reporterName", "status", "body", "warnings", "decidedByName", "decidedAt", "decisionNote", "batchId", "createdAt" FROM "field_report"',
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
    await queryRunner.query('DROP INDEX "IDX_99cda8b55e108fe2fa05a28f17"')
    await queryRunner.query('DROP INDEX "IDX_402243837319f816db34938d78"')
    await queryRunner.query('DROP INDEX "IDX_5268c41580d672bd775340ff9c"')
    await queryRunner.query(
      'CREATE TABLE "temporary_field_report_link" ("id" integer PRIMARY KEY AUTOINCREMENT NOT NULL, "reportId" integer NOT NULL, "linkId" integer NOT NULL, "batchId" integer NOT NULL, "agrees" integer NOT NULL, CONSTRAINT "FK_710e42e608c43c1ea19641d5d95" FOREIGN KEY ("reportId") REFERENCES "field_report" ("id") ON DELETE CASCADE ON UPDATE NO ACTION, CONSTRAINT "FK_99cda8b55e108fe2fa05a28f175" FOREIGN KEY ("linkId") REFERENCES "link" ("id") ON DELETE CASCADE ON UPDATE NO ACTION)',
    )
    await queryRunner.query(
      'INSERT INTO "temporary_field_report_link"("id", "reportId", "linkId", "batchId", "agrees") SELECT "id", "reportId", "linkId", "batchId", "agrees" FROM "field_report_link"',
    )
    await queryRunner.query('DROP TABLE "field_report_link"')
    await queryRunner.query('ALTER TABLE "temporary_field_report_link" RENAME TO "field_report_link"')
    await queryRunner.query('CREATE INDEX "IDX_99cda8b55e108fe2fa05a28f17" ON "field_report_link" ("linkId") ')
    await queryRunner.query('CREATE INDEX "IDX_402243837319f816db34938d78" ON "field_report_link" ("batchId") ')
    await queryRunner.query('CREATE UNIQUE INDEX "IDX_5268c41580d672bd775340ff9c" ON "field_report_link" ("reportId", "linkId") ')
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query('DROP INDEX "IDX_5268c41580d672bd775340ff9c"')
    await queryRunner.query('DROP INDEX "IDX_402243837319f816db34938d78"')
    await queryRunner.query('DROP INDEX "IDX_99cda8b55e108fe2fa05a28f17"')
    await queryRunner.query('ALTER TABLE "field_report_link" RENAME TO "temporary_field_report_link"')
    await queryRunner.query(
      'CREATE TABLE "field_report_link" ("id" integer PRIMARY KEY AUTOINCREMENT NOT NULL, "reportId" integer NOT NULL, "linkId" integer NOT NULL, "batchId" integer NOT NULL, "agrees" integer NOT NULL)',
    )
    await queryRunner.query(
      'INSERT INTO "field_report_link"("id", "reportId", "linkId", "batchId", "agrees") SELECT "id", "reportId", "linkId", "batchId", "agrees" FROM "temporary_field_report_link"',
    )
    await queryRunner.query('DROP TABLE "temporary_field_report_link"')
    await queryRunner.query('CREATE UNIQUE INDEX "IDX_5268c41580d672bd775340ff9c" ON "field_report_link" ("reportId", "linkId") ')
    await queryRunner.query('CREATE INDEX "IDX_402243837319f816db34938d78" ON "field_report_link" ("batchId") ')
    await queryRunner.query('CREATE INDEX "IDX_99cda8b55e108fe2fa05a28f17" ON "field_report_link" ("linkId") ')
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
      'CREATE TABLE "field_report" ("id" integer PRIMARY KEY AUTOINCREMENT NOT NULL, "reporterId" integer, "reporterName" text NOT NULL, "status" text NOT NULL DEFAULT (\'submitted\'), "body" text NOT NULL, "warnings" text NOT NULL DEFAULT (\'[]\'), "decidedByName" text, "decidedAt" datetime, "decisionNote" text NOT NULL DEFAULT (\'\'), "batchId" integer, "createdAt" datetime NOT NULL DEFAULT (datetime(\'now\')))',
    )
    await queryRunner.query(
      'INSERT INTO "field_report"("id", "reporterId", "reporterName", "status", "body", "warnings", "decidedByName", "decidedAt", "decisionNote", "batchId", "createdAt") SELECT "id", "reporterId", "reporterName", "status", "body", "warnings", "decidedByName", "decidedAt", "decisionNote", "batchId", "createdAt" FROM "temporary_field_report"',
    )
    await queryRunner.query('DROP TABLE "temporary_field_report"')
    await queryRunner.query('CREATE INDEX "IDX_1a4495852587a97930e4e20a09" ON "field_report" ("status", "id") ')
    await queryRunner.query('CREATE INDEX "IDX_c761afe91c2c03170dab303134" ON "field_report" ("reporterId") ')
    await queryRunner.query('DROP INDEX "IDX_5268c41580d672bd775340ff9c"')
    await queryRunner.query('DROP INDEX "IDX_402243837319f816db34938d78"')
    await queryRunner.query('DROP INDEX "IDX_99cda8b55e108fe2fa05a28f17"')
    await queryRunner.query('DROP TABLE "field_report_link"')
    await queryRunner.query('DROP INDEX "IDX_7f86b755dbd076bb94e3b6eeb4"')
    await queryRunner.query('DROP TABLE "field_report_photo"')
    await queryRunner.query('DROP INDEX "IDX_1a4495852587a97930e4e20a09"')
    await queryRunner.query('DROP INDEX "IDX_c761afe91c2c03170dab303134"')
    await queryRunner.query('DROP TABLE "field_report"')
  }
}
