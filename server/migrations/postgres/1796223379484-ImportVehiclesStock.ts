import type { MigrationInterface, QueryRunner } from 'typeorm'

export class ImportVehiclesStock1796223379484 implements MigrationInterface {
  name = 'ImportVehiclesStock1796223379484'

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query('ALTER TABLE "stock_item" ADD "batchId" integer')
    await queryRunner.query('ALTER TABLE "vehicle_application" ADD "batchId" integer')
    await queryRunner.query('CREATE INDEX "IDX_d4f3ac91515414f3700b8ae09d" ON "stock_item"  ("batchId") ')
    await queryRunner.query('CREATE INDEX "IDX_6b31beae7e3e4a94efacb20a59" ON "vehicle_application"  ("batchId") ')
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query('DROP INDEX "public"."IDX_6b31beae7e3e4a94efacb20a59"')
    await queryRunner.query('DROP INDEX "public"."IDX_d4f3ac91515414f3700b8ae09d"')
    await queryRunner.query('ALTER TABLE "vehicle_application" DROP COLUMN "batchId"')
    await queryRunner.query('ALTER TABLE "stock_item" DROP COLUMN "batchId"')
  }
}
