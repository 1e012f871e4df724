import type { MigrationInterface, QueryRunner } from 'typeorm'

export class MailOutbox1796212721111 implements MigrationInterface {
  name = 'MailOutbox1796212721111'

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(
      'CREATE TABLE "mail_outbox" ("id" integer PRIMARY KEY AUTOINCREMENT NOT NULL, "kind" text NOT NULL, "recipient" text NOT NULL, "subject" text NOT NULL, "text" text NOT NULL, "html" text NOT NULL, "status" text NOT NULL DEFAULT (\'queued\'), "attempts" integer NOT NULL DEFAULT (0), "lastError" text NOT NULL DEFAULT (\'\'), "nextAttemptAt" datetime NOT NULL, "sentAt" datetime, "createdAt" datetime NOT NULL DEFAULT (datetime(\'now\')))',
    )
    await queryRunner.query('CREATE INDEX "IDX_4537a362b5e891c5aba08e0c31" ON "mail_outbox" ("status", "nextAttemptAt") ')
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query('DROP INDEX "IDX_4537a362b5e891c5aba08e0c31"')
    await queryRunner.query('DROP TABLE "mail_outbox"')
  }
}
