import type { MigrationInterface, QueryRunner } from 'typeorm'

export class FaceFinish1796279676351 implements MigrationInterface {
  name = 'FaceFinish1796279676351'

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query('ALTER TABLE "build_sheet" ADD "faceFinish" text')
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query('ALTER TABLE "build_sheet" DROP COLUMN "faceFinish"')
  }
}
