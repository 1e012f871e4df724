import type { MigrationInterface, QueryRunner } from 'typeorm'

export class SharedLinks1796227511872 implements MigrationInterface {
  name = 'SharedLinks1796227511872'

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(
      'CREATE TABLE "shared_link" ("id" integer PRIMARY KEY AUTOINCREMENT NOT NULL, "kind" varchar(10) NOT NULL, "targetId" integer NOT NULL, "tokenHash" varchar(64) NOT NULL, "expiresAt" datetime NOT NULL, "sharedById" integer NOT NULL, "recipient" text NOT NULL, "createdAt" datetime NOT NULL DEFAULT (datetime(\'now\')))',
    )
    await queryRunner.query('CREATE UNIQUE INDEX "IDX_99b2060794ebcbef011bcf6dba" ON "shared_link" ("tokenHash") ')
    await queryRunner.query('CREATE INDEX "IDX_5594f0a743dcf0c3841a3b893e" ON "shared_link" ("sharedById") ')
    await queryRunner.query('CREATE INDEX "IDX_8d7bee5db90ac2f3a447c1cb66" ON "shared_link" ("kind", "targetId") ')
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query('DROP INDEX "IDX_8d7bee5db90ac2f3a447c1cb66"')
    await queryRunner.query('DROP INDEX "IDX_5594f0a743dcf0c3841a3b893e"')
    await queryRunner.query('DROP INDEX "IDX_99b2060794ebcbef011bcf6dba"')
    await queryRunner.query('DROP TABLE "shared_link"')
  }
}
