import type { MigrationInterface, QueryRunner } from 'typeorm'

export class Vehicles1796213931900 implements MigrationInterface {
  name = 'Vehicles1796213931900'

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(
      'CREATE TABLE "vehicle_application" ("id" integer PRIMARY KEY AUTOINCREMENT NOT NULL, "yearFrom" integer NOT NULL, "yearTo" integer NOT NULL, "make" text NOT NULL, "model" text NOT NULL, "body" text NOT NULL DEFAULT (\'\'), "market" text NOT NULL DEFAULT (\'\'), "engineFamily" text NOT NULL)',
    )
    await queryRunner.query('CREATE INDEX "IDX_2482d4c50ed5671e18b1fb5d91" ON "vehicle_application" ("yearFrom") ')
    await queryRunner.query('CREATE INDEX "IDX_78bdc3277cce3bc2589f47bd25" ON "vehicle_application" ("make", "model") ')
    await queryRunner.query(
      'CREATE TABLE "vehicle_original" ("vehicleId" integer NOT NULL, "slot" text NOT NULL, "partId" integer NOT NULL, PRIMARY KEY ("vehicleId", "slot"))',
    )
    await queryRunner.query('CREATE INDEX "IDX_c0d92466d593dba19c3dcbc3e7" ON "vehicle_original" ("partId") ')
    await queryRunner.query('DROP INDEX "IDX_c0d92466d593dba19c3dcbc3e7"')
    await queryRunner.query(
      'CREATE TABLE "temporary_vehicle_original" ("vehicleId" integer NOT NULL, "slot" text NOT NULL, "partId" integer NOT NULL, CONSTRAINT "FK_a5c5dba406e58ba35337fb8ab2a" FOREIGN KEY ("vehicleId") REFERENCES "vehicle_application" ("id") ON DELETE CASCADE ON UPDATE NO ACTION, CONSTRAINT "FK_c0d92466d593dba19c3dcbc3e76" FOREIGN KEY ("partId") REFERENCES "part" ("id") ON DELETE RESTRICT ON UPDATE NO ACTION, PRIMARY KEY ("vehicleId", "slot"))',
    )
    await queryRunner.query(
      'INSERT INTO "temporary_vehicle_original"("vehicleId", "slot", "partId") SELECT "vehicleId", "slot", "partId" FROM "vehicle_original"',
    )
    await queryRunner.query('DROP TABLE "vehicle_original"')
    await queryRunner.query('ALTER TABLE "temporary_vehicle_original" RENAME TO "vehicle_original"')
    await queryRunner.query('CREATE INDEX "IDX_c0d92466d593dba19c3dcbc3e7" ON "vehicle_original" ("partId") ')
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query('DROP INDEX "IDX_c0d92466d593dba19c3dcbc3e7"')
    await queryRunner.query('ALTER TABLE "vehicle_original" RENAME TO "temporary_vehicle_original"')
    await queryRunner.query(
      'CREATE TABLE "vehicle_original" ("vehicleId" integer NOT NULL, "slot" text NOT NULL, "partId" integer NOT NULL, PRIMARY KEY ("vehicleId", "slot"))',
    )
    await queryRunner.query(
      'INSERT INTO "vehicle_original"("vehicleId", "slot", "partId") SELECT "vehicleId", "slot", "partId" FROM "temporary_vehicle_original"',
    )
    await queryRunner.query('DROP TABLE "temporary_vehicle_original"')
    await queryRunner.query('CREATE INDEX "IDX_c0d92466d593dba19c3dcbc3e7" ON "vehicle_original" ("partId") ')
    await queryRunner.query('DROP INDEX "IDX_c0d92466d593dba19c3dcbc3e7"')
    await queryRunner.query('DROP TABLE "vehicle_original"')
    await queryRunner.query('DROP INDEX "IDX_78bdc3277cce3bc2589f47bd25"')
    await queryRunner.query('DROP INDEX "IDX_2482d4c50ed5671e18b1fb5d91"')
    await queryRunner.query('DROP TABLE "vehicle_application"')
  }
}
