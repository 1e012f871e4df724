import type { MigrationInterface, QueryRunner } from 'typeorm'

export class SharedLinks1796227515397 implements MigrationInterface {
  name = 'SharedLinks1796227515397'

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(
      'CREATE TABLE "shared_link" ("id" SERIAL NOT NULL, "kind" character varying(10) NOT NULL, "targetId" integer NOT NULL, "tokenHash" character varying(64) NOT NULL, "expiresAt" TIMESTAMP NOT NULL, "sharedById" integer NOT NULL, "recipient" text NOT NULL, "createdAt" TIMESTAMP NOT NULL DEFAULT now(), CONSTRAINT "PK_ab659d1f4b5a1c3778e947c304a" PRIMARY KEY ("id"))',
    )
    await queryRunner.query('CREATE UNIQUE INDEX "IDX_99b2060794ebcbef011bcf6dba" ON "shared_link"  ("tokenHash") ')
    await queryRunner.query('CREATE INDEX "IDX_5594f0a743dcf0c3841a3b893e" ON "shared_link"  ("sharedById") ')
    await queryRunner.query('CREATE INDEX "IDX_8d7bee5db90ac2f3a447c1cb66" ON "shared_link"  ("kind", "targetId") ')
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query('DROP INDEX "public"."IDX_8d7bee5db90ac2f3a447c1cb66"')
    await queryRunner.query('DROP INDEX "public"."IDX_5594f0a743dcf0c3841a3b893e"')
    await queryRunner.query('DROP INDEX "public"."IDX_99b2060794ebcbef011bcf6dba"')
    await queryRunner.query('DROP TABLE "shared_link"')
  }
}
