import type { MigrationInterface, QueryRunner } from 'typeorm'

export class SignInThrottle1796213598364 implements MigrationInterface {
  name = 'SignInThrottle1796213598364'

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(
      'CREATE TABLE "sign_in_throttle" ("key" character varying(400) NOT NULL, "failures" integer NOT NULL, "windowStartedAt" bigint NOT NULL, CONSTRAINT "PK_f838c82d37e24773fc7984a7649" PRIMARY KEY ("key"))',
    )
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query('DROP TABLE "sign_in_throttle"')
  }
}
