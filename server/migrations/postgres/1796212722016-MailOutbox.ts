import type { MigrationInterface, QueryRunner } from 'typeorm'

export class MailOutbox1796212722016 implements MigrationInterface {
  name = 'MailOutbox1796212722016'

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(
      'CREATE TABLE "mail_outbox" ("id" SERIAL NOT NULL, "kind" text NOT NULL, "recipient" text NOT NULL, "subject" text NOT NULL, "text" text NOT NULL, "html" text NOT NULL, "status" text NOT NULL DEFAULT \'queued\', "attempts" integer NOT NULL DEFAULT \'0\', "lastError" text NOT NULL DEFAULT \'\', "nextAttemptAt" TIMESTAMP NOT NULL, "sentAt" TIMESTAMP, "createdAt" TIMESTAMP NOT NULL DEFAULT now(), CONSTRAINT "PK_fecc63c96385bc35a39ccf2a72e" PRIMARY KEY ("id"))',
    )
    await queryRunner.query('CREATE INDEX "IDX_4537a362b5e891c5aba08e0c31" ON "mail_outbox"  ("status", "nextAttemptAt") ')
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query('DROP INDEX "public"."IDX_4537a362b5e891c5aba08e0c31"')
    await queryRunner.query('DROP TABLE "mail_outbox"')
  }
}
