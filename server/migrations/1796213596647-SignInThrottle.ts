import type { MigrationInterface, QueryRunner } from 'typeorm'

export class SignInThrottle1796213596647 implements MigrationInterface {
  name = 'SignInThrottle1796213596647'

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(
      'CREATE TABLE "sign_in_throttle" ("key" varchar(400) PRIMARY KEY NOT NULL, "failures" integer NOT NULL, "windowStartedAt" bigint NOT NULL)',
    )
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query('DROP TABLE "sign_in_throttle"')
  }
}
