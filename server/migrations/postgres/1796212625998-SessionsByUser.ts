import type { MigrationInterface, QueryRunner } from 'typeorm'

/** PostgreSQL's side of SessionsByUser1796212625077 (generated, then the old session table dropped by hand). */
export class SessionsByUser1796212625998 implements MigrationInterface {
  name = 'SessionsByUser1796212625998'

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(
      'CREATE TABLE "user_session" ("id" character varying(255) NOT NULL, "userId" integer, "data" text NOT NULL, "expiresAt" bigint NOT NULL, "startedAt" bigint NOT NULL, CONSTRAINT "PK_adf3b49590842ac3cf54cac451a" PRIMARY KEY ("id"))',
    )
    await queryRunner.query('CREATE INDEX "IDX_b5eb7aa08382591e7c2d1244fe" ON "user_session"  ("userId") ')
    await queryRunner.query('CREATE INDEX "IDX_07353ae059e2669774d83f9dbb" ON "user_session"  ("expiresAt") ')
    await queryRunner.query('ALTER TABLE "user" ADD "disabledAt" TIMESTAMP')
    await queryRunner.query('DROP TABLE "session"')
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(
      'CREATE TABLE "session" ("expiredAt" bigint NOT NULL, "id" character varying(255) NOT NULL, "json" text NOT NULL, "destroyedAt" TIMESTAMP, CONSTRAINT "PK_f55da76ac1c3ac420f444d2ff11" PRIMARY KEY ("id"))',
    )
    await queryRunner.query('CREATE INDEX "IDX_28c5d1d16da7908c97c9bc2f74" ON "session"  ("expiredAt") ')
    await queryRunner.query('ALTER TABLE "user" DROP COLUMN "disabledAt"')
    await queryRunner.query('DROP INDEX "public"."IDX_07353ae059e2669774d83f9dbb"')
    await queryRunner.query('DROP INDEX "public"."IDX_b5eb7aa08382591e7c2d1244fe"')
    await queryRunner.query('DROP TABLE "user_session"')
  }
}
