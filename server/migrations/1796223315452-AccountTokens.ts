import type { MigrationInterface, QueryRunner } from 'typeorm'

export class AccountTokens1796223315452 implements MigrationInterface {
  name = 'AccountTokens1796223315452'

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(
      'CREATE TABLE "account_token" ("id" integer PRIMARY KEY AUTOINCREMENT NOT NULL, "userId" integer NOT NULL, "purpose" varchar(20) NOT NULL, "tokenHash" varchar(64) NOT NULL, "expiresAt" datetime NOT NULL, "usedAt" datetime, "createdAt" datetime NOT NULL DEFAULT (datetime(\'now\')))',
    )
    await queryRunner.query('CREATE INDEX "IDX_ca15dea3ff807360bfdd30d957" ON "account_token" ("userId") ')
    await queryRunner.query('CREATE UNIQUE INDEX "IDX_1261696c0041394536e91c0a81" ON "account_token" ("tokenHash") ')
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query('DROP INDEX "IDX_1261696c0041394536e91c0a81"')
    await queryRunner.query('DROP INDEX "IDX_ca15dea3ff807360bfdd30d957"')
    await queryRunner.query('DROP TABLE "account_token"')
  }
}
