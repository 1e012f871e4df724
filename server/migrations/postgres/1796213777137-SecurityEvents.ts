import type { MigrationInterface, QueryRunner } from 'typeorm'

export class SecurityEvents1796213777137 implements MigrationInterface {
  name = 'SecurityEvents1796213777137'

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(
      'CREATE TABLE "security_event" ("id" SERIAL NOT NULL, "kind" character varying(40) NOT NULL, "at" TIMESTAMP NOT NULL, "actorId" integer, "actorEmail" text, "address" character varying(100), "detail" text, CONSTRAINT "PK_fb070407ce281c218223836bad4" PRIMARY KEY ("id"))',
    )
    await queryRunner.query('CREATE INDEX "IDX_7674873b6fca8907c7a0b32308" ON "security_event"  ("at") ')
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query('DROP INDEX "public"."IDX_7674873b6fca8907c7a0b32308"')
    await queryRunner.query('DROP TABLE "security_event"')
  }
}
