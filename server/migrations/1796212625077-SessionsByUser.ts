import type { MigrationInterface, QueryRunner } from 'typeorm'

/**
 * Sessions in a store of our own, with the user id as a column (so a password
 * change or a disabled account ends them all) and a start time (the absolute
 * lifetime); a user can be disabled. Sessions from the old table are dropped:
 * everyone signs in once more.
 */
export class SessionsByUser1796212625077 implements MigrationInterface {
  name = 'SessionsByUser1796212625077'

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(
      'CREATE TABLE "user_session" ("id" varchar(255) PRIMARY KEY NOT NULL, "userId" integer, "data" text NOT NULL, "expiresAt" bigint NOT NULL, "startedAt" bigint NOT NULL)',
    )
    await queryRunner.query('CREATE INDEX "IDX_b5eb7aa08382591e7c2d1244fe" ON "user_session" ("userId") ')
    await queryRunner.query('CREATE INDEX "IDX_07353ae059e2669774d83f9dbb" ON "user_session" ("expiresAt") ')
    // Added in place rather than by rebuilding the table, which build sheets reference.
    await queryRunner.query('ALTER TABLE "user" ADD COLUMN "disabledAt" datetime')
    await queryRunner.query('DROP INDEX "IDX_28c5d1d16da7908c97c9bc2f74"')
    await queryRunner.query('DROP TABLE "session"')
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(
      'CREATE TABLE "session" ("expiredAt" bigint NOT NULL, "id" varchar(255) PRIMARY KEY NOT NULL, "json" text NOT NULL, "destroyedAt" datetime)',
    )
    await queryRunner.query('CREATE INDEX "IDX_28c5d1d16da7908c97c9bc2f74" ON "session" ("expiredAt") ')
    await queryRunner.query('ALTER TABLE "user" DROP COLUMN "disabledAt"')
    await queryRunner.query('DROP INDEX "IDX_07353ae059e2669774d83f9dbb"')
    await queryRunner.query('DROP INDEX "IDX_b5eb7aa08382591e7c2d1244fe"')
    await queryRunner.query('DROP TABLE "user_session"')
  }
}
