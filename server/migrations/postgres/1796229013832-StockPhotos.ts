import type { MigrationInterface, QueryRunner } from 'typeorm'

export class StockPhotos1796229013832 implements MigrationInterface {
  name = 'StockPhotos1796229013832'

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(
      'CREATE TABLE "stock_photo" ("id" SERIAL NOT NULL, "stockItemId" integer NOT NULL, "position" integer NOT NULL, "displayKey" text NOT NULL, "thumbKey" text NOT NULL, "width" integer NOT NULL, "height" integer NOT NULL, CONSTRAINT "PK_6661f10c28be73216de96e45dc0" PRIMARY KEY ("id"))',
    )
    await queryRunner.query('CREATE INDEX "IDX_897c7a68af25b4108a25eb3e8f" ON "stock_photo"  ("stockItemId") ')
    await queryRunner.query(
      'ALTER TABLE "stock_photo" ADD CONSTRAINT "FK_897c7a68af25b4108a25eb3e8f5" FOREIGN KEY ("stockItemId") REFERENCES "stock_item"("id") ON DELETE CASCADE ON UPDATE NO ACTION',
    )
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query('ALTER TABLE "stock_photo" DROP CONSTRAINT "FK_897c7a68af25b4108a25eb3e8f5"')
    await queryRunner.query('DROP INDEX "public"."IDX_897c7a68af25b4108a25eb3e8f"')
    await queryRunner.query('DROP TABLE "stock_photo"')
  }
}
