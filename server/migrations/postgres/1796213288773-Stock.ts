import type { MigrationInterface, QueryRunner } from 'typeorm'

export class Stock1796213288773 implements MigrationInterface {
  name = 'Stock1796213288773'

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(
      'CREATE TABLE "site" ("id" SERIAL NOT NULL, "name" text NOT NULL, "address" text NOT NULL DEFAULT \'\', "createdAt" TIMESTAMP NOT NULL DEFAULT now(), CONSTRAINT "UQ_9669a09fcc0eb6d2794a658f647" UNIQUE ("name"), CONSTRAINT "PK_635c0eeabda8862d5b0237b42b4" PRIMARY KEY ("id"))',
    )
    await queryRunner.query(
      'CREATE TABLE "stock_item" ("id" SERIAL NOT NULL, "partId" integer NOT NULL, "siteId" integer NOT NULL, "condition" text NOT NULL, "grade" text, "mileageKm" integer, "donorVin" text, "donorYear" integer, "damageNotes" text NOT NULL DEFAULT \'\', "location" text NOT NULL DEFAULT \'\', "priceCents" integer NOT NULL, "coreChargeCents" integer NOT NULL DEFAULT \'0\', "status" text NOT NULL DEFAULT \'available\', "label" text, "createdAt" TIMESTAMP NOT NULL DEFAULT now(), "updatedAt" TIMESTAMP NOT NULL DEFAULT now(), CONSTRAINT "PK_0b51047279d22d97442d46dfee8" PRIMARY KEY ("id"))',
    )
    await queryRunner.query('CREATE INDEX "IDX_d3dce2237f98798ebdadbacae4" ON "stock_item"  ("siteId") ')
    await queryRunner.query('CREATE UNIQUE INDEX "IDX_3bc0304587090e048550b98736" ON "stock_item"  ("label") ')
    await queryRunner.query('CREATE INDEX "IDX_a47500abb433861684f55d5487" ON "stock_item"  ("partId", "status") ')
    await queryRunner.query(
      'ALTER TABLE "stock_item" ADD CONSTRAINT "FK_e71ee43367e7708ff22454cb184" FOREIGN KEY ("partId") REFERENCES "part"("id") ON DELETE RESTRICT ON UPDATE NO ACTION',
    )
    await queryRunner.query(
      'ALTER TABLE "stock_item" ADD CONSTRAINT "FK_d3dce2237f98798ebdadbacae46" FOREIGN KEY ("siteId") REFERENCES "site"("id") ON DELETE RESTRICT ON UPDATE NO ACTION',
    )
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query('ALTER TABLE "stock_item" DROP CONSTRAINT "FK_d3dce2237f98798ebdadbacae46"')
    await queryRunner.query('ALTER TABLE "stock_item" DROP CONSTRAINT "FK_e71ee43367e7708ff22454cb184"')
    await queryRunner.query('DROP INDEX "public"."IDX_a47500abb433861684f55d5487"')
    await queryRunner.query('DROP INDEX "public"."IDX_3bc0304587090e048550b98736"')
    await queryRunner.query('DROP INDEX "public"."IDX_d3dce2237f98798ebdadbacae4"')
    await queryRunner.query('DROP TABLE "stock_item"')
    await queryRunner.query('DROP TABLE "site"')
  }
}
