import type { MigrationInterface, QueryRunner } from 'typeorm'

export class AccountTokens1796223318439 implements MigrationInterface {
  name = 'AccountTokens1796223318439'

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(
      'CREATE TABLE "account_token" ("id" SERIAL NOT NULL, "userId" integer NOT NULL, "purpose" character varying(20) NOT NULL, "tokenHash" character varying(64) NOT NULL, "expiresAt" TIMESTAMP NOT NULL, "usedAt" TIMESTAMP, "createdAt" TIMESTAMP NOT NULL DEFAULT now(), CONSTRAINT "PK_a55842d3341d42534e39f85e931" PRIMARY KEY ("id"))',
    )
    await queryRunner.query('CREATE INDEX "IDX_ca15dea3ff807360bfdd30d957" ON "account_token"  ("userId") ')
    await queryRunner.query('CREATE UNIQUE INDEX "IDX_1261696c0041394536e91c0a81" ON "account_token"  ("tokenHash") ')
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query('DROP INDEX "public"."IDX_1261696c0041394536e91c0a81"')
    await queryRunner.query('DROP INDEX "public"."IDX_ca15dea3ff807360bfdd30d957"')
    await queryRunner.query('DROP TABLE "account_token"')
  }
}
