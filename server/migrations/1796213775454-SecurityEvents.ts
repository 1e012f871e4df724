import type { MigrationInterface, QueryRunner } from 'typeorm'

export class SecurityEvents1796213775454 implements MigrationInterface {
  name = 'SecurityEvents1796213775454'

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(
      'CREATE TABLE "security_event" ("id" integer PRIMARY KEY AUTOINCREMENT NOT NULL, "kind" varchar(40) NOT NULL, "at" datetime NOT NULL, "actorId" integer, "actorEmail" text, "address" varchar(100), "detail" text)',
    )
    await queryRunner.query('CREATE INDEX "IDX_7674873b6fca8907c7a0b32308" ON "security_event" ("at") ')
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query('DROP INDEX "IDX_7674873b6fca8907c7a0b32308"')
    await queryRunner.query('DROP TABLE "security_event"')
  }
}
