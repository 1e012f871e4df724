import type { MigrationInterface, QueryRunner } from 'typeorm'

export class FieldReports1796211781982 implements MigrationInterface {
  name = 'FieldReports1796211781982'

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(
      'CREATE TABLE "part_word" ("partId" integer NOT NULL, "word" text NOT NULL, CONSTRAINT "PK_03ef4bc2c60219f0e1613cba8b0" PRIMARY KEY ("partId", "word"))',
    )
    await queryRunner.query('CREATE INDEX "IDX_e13831c3aa6f47e0b21ef61600" ON "part_word"  ("word") ')
    await queryRunner.query(
      'CREATE TABLE "field_report" ("id" SERIAL NOT NULL, "reporterId" integer, "reporterName" text NOT NULL, "status" text NOT NULL DEFAULT \'submitted\', "body" text NOT NULL, "warnings" text NOT NULL DEFAULT \'[]\', "decidedByName" text, "decidedAt" TIMESTAMP, "decisionNote" text NOT NULL DEFAULT \'\', "batchId" integer, "createdAt" TIMESTAMP NOT NULL DEFAULT now(), CONSTRAINT "PK_93a739d5c71807b18dce3bbb669" PRIMARY KEY ("id"))',
    )
    await queryRunner.query('CREATE INDEX "IDX_c761afe91c2c03170dab303134" ON "field_report"  ("reporterId") ')
    await queryRunner.query('CREATE INDEX "IDX_1a4495852587a97930e4e20a09" ON "field_report"  ("status", "id") ')
    await queryRunner.query(
      'CREATE TABLE "field_report_photo" ("id" SERIAL NOT NULL, "reportId" integer NOT NULL, "position" integer NOT NULL, "displayKey" text NOT NULL, "thumbKey" text NOT NULL, "width" integer NOT NULL, "height" integer NOT NULL, CONSTRAINT "PK_36b1695fec00681dd4616336c82" PRIMARY KEY ("id"))',
    )
    await queryRunner.query('CREATE INDEX "IDX_7f86b755dbd076bb94e3b6eeb4" ON "field_report_photo"  ("reportId") ')
    await queryRunner.query(
      'CREATE TABLE "field_report_link" ("id" SERIAL NOT NULL, "reportId" integer NOT NULL, "linkId" integer NOT NULL, "batchId" integer NOT NULL, "agrees" integer NOT NULL, CONSTRAINT "PK_3194f088e5756f2cc5d62caa470" PRIMARY KEY ("id"))',
    )
    await queryRunner.query('CREATE INDEX "IDX_99cda8b55e108fe2fa05a28f17" ON "field_report_link"  ("linkId") ')
    await queryRunner.query('CREATE INDEX "IDX_402243837319f816db34938d78" ON "field_report_link"  ("batchId") ')
    await queryRunner.query('CREATE UNIQUE INDEX "IDX_5268c41580d672bd775340ff9c" ON "field_report_link"  ("reportId", "linkId") ')
    await queryRunner.query(
      'ALTER TABLE "part_word" ADD CONSTRAINT "FK_4fd4d77e8563f231a9ca1464e55" FOREIGN KEY ("partId") REFERENCES "part"("id") ON DELETE CASCADE ON UPDATE NO ACTION',
    )
    await queryRunner.query(
      'ALTER TABLE "field_report" ADD CONSTRAINT "FK_c761afe91c2c03170dab303134b" FOREIGN KEY ("reporterId") REFERENCES "user"("id") ON DELETE SET NULL ON UPDATE NO ACTION',
    )
    await queryRunner.query(
      'ALTER TABLE "field_report_photo" ADD CONSTRAINT "FK_7f86b755dbd076bb94e3b6eeb4d" FOREIGN KEY ("reportId") REFERENCES "field_report"("id") ON DELETE CASCADE ON UPDATE NO ACTION',
    )
    await queryRunner.query(
      'ALTER TABLE "field_report_link" ADD CONSTRAINT "FK_710e42e608c43c1ea19641d5d95" FOREIGN KEY ("reportId") REFERENCES "field_report"("id") ON DELETE CASCADE ON UPDATE NO ACTION',
    )
    await queryRunner.query(
      'ALTER TABLE "field_report_link" ADD CONSTRAINT "FK_99cda8b55e108fe2fa05a28f175" FOREIGN KEY ("linkId") REFERENCES "link"("id") ON DELETE CASCADE ON UPDATE NO ACTION',
    )
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query('ALTER TABLE "field_report_link" DROP CONSTRAINT "FK_99cda8b55e108fe2fa05a28f175"')
    await queryRunner.query('ALTER TABLE "field_report_link" DROP CONSTRAINT "FK_710e42e608c43c1ea19641d5d95"')
    await queryRunner.query('ALTER TABLE "field_report_photo" DROP CONSTRAINT "FK_7f86b755dbd076bb94e3b6eeb4d"')
    await queryRunner.query('ALTER TABLE "field_report" DROP CONSTRAINT "FK_c761afe91c2c03170dab303134b"')
    await queryRunner.query('ALTER TABLE "part_word" DROP CONSTRAINT "FK_4fd4d77e8563f231a9ca1464e55"')
    await queryRunner.query('DROP INDEX "public"."IDX_5268c41580d672bd775340ff9c"')
    await queryRunner.query('DROP INDEX "public"."IDX_402243837319f816db34938d78"')
    await queryRunner.query('DROP INDEX "public"."IDX_99cda8b55e108fe2fa05a28f17"')
    await queryRunner.query('DROP TABLE "field_report_link"')
    await queryRunner.query('DROP INDEX "public"."IDX_7f86b755dbd076bb94e3b6eeb4"')
    await queryRunner.query('DROP TABLE "field_report_photo"')
    await queryRunner.query('DROP INDEX "public"."IDX_1a4495852587a97930e4e20a09"')
    await queryRunner.query('DROP INDEX "public"."IDX_c761afe91c2c03170dab303134"')
    await queryRunner.query('DROP TABLE "field_report"')
    await queryRunner.query('DROP INDEX "public"."IDX_e13831c3aa6f47e0b21ef61600"')
    await queryRunner.query('DROP TABLE "part_word"')
  }
}
