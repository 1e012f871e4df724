import type { MigrationInterface, QueryRunner } from 'typeorm'

export class Foundation1796197547678 implements MigrationInterface {
  name = 'Foundation1796197547678'

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(
      'CREATE TABLE "app_setting" ("key" text NOT NULL, "value" text NOT NULL, CONSTRAINT "PK_0d66bfb0d9f93124a4549d21af0" PRIMARY KEY ("key"))',
    )
    await queryRunner.query(
      'CREATE TABLE "user" ("id" SERIAL NOT NULL, "email" text NOT NULL, "name" text NOT NULL, "role" text NOT NULL, "passwordHash" text NOT NULL, "createdAt" TIMESTAMP NOT NULL DEFAULT now(), CONSTRAINT "UQ_e12875dfb3b1d92d7d7c5377e22" UNIQUE ("email"), CONSTRAINT "PK_cace4a159ff9f2512dd42373760" PRIMARY KEY ("id"))',
    )
    await queryRunner.query(
      'CREATE TABLE "build_sheet" ("id" SERIAL NOT NULL, "ownerId" integer NOT NULL, "name" text NOT NULL, "slots" text NOT NULL, "targetPowerKw" double precision, "fuelOctane" double precision, "chassisModelYear" integer, "vin" text, "notes" text NOT NULL DEFAULT \'\', "createdAt" TIMESTAMP NOT NULL DEFAULT now(), "updatedAt" TIMESTAMP NOT NULL DEFAULT now(), CONSTRAINT "PK_c1d6a0e8e192ffb1ccf78ae5e60" PRIMARY KEY ("id"))',
    )
    await queryRunner.query('CREATE INDEX "IDX_540bb6362dd999a52e5d10b993" ON "build_sheet"  ("ownerId") ')
    await queryRunner.query(
      'CREATE TABLE "part" ("id" SERIAL NOT NULL, "partNumber" text NOT NULL, "partKey" text NOT NULL, "kind" text NOT NULL, "name" text NOT NULL, "family" text NOT NULL DEFAULT \'\', "yearFrom" integer, "yearTo" integer, "notes" text NOT NULL DEFAULT \'\', "attributes" text NOT NULL, "batchId" integer, "createdAt" TIMESTAMP NOT NULL DEFAULT now(), "updatedAt" TIMESTAMP NOT NULL DEFAULT now(), CONSTRAINT "UQ_81b3dff0646d6190751b82cea87" UNIQUE ("partNumber"), CONSTRAINT "PK_58888debdf048d2dfe459aa59da" PRIMARY KEY ("id"))',
    )
    await queryRunner.query('CREATE INDEX "IDX_0e7d72b06bd86b591224e1ab93" ON "part"  ("partKey") ')
    await queryRunner.query('CREATE INDEX "IDX_b8f82d97f1123fff02a8f9bf86" ON "part"  ("kind") ')
    await queryRunner.query('CREATE INDEX "IDX_a04370ac35038b3ae60e48868f" ON "part"  ("family") ')
    await queryRunner.query('CREATE INDEX "IDX_001d0a95bd9ebd39b1635a6567" ON "part"  ("batchId") ')
    await queryRunner.query(
      'CREATE TABLE "part_identity" ("id" SERIAL NOT NULL, "partAId" integer NOT NULL, "partBId" integer NOT NULL, "note" text NOT NULL DEFAULT \'\', "source" text NOT NULL, "batchId" integer, "createdAt" TIMESTAMP NOT NULL DEFAULT now(), CONSTRAINT "CHK_e37e2f034911d3b7469ef42050" CHECK ("partAId" < "partBId"), CONSTRAINT "PK_6636db30b2a9b73340b29855206" PRIMARY KEY ("id"))',
    )
    await queryRunner.query('CREATE INDEX "IDX_42534bfd9591f74712d8b8b3aa" ON "part_identity"  ("partBId") ')
    await queryRunner.query('CREATE INDEX "IDX_05ccda2089f43c89c46f993230" ON "part_identity"  ("batchId") ')
    await queryRunner.query('CREATE UNIQUE INDEX "IDX_998ce2b7a2198109237a14f5fc" ON "part_identity"  ("partAId", "partBId") ')
    await queryRunner.query(
      'CREATE TABLE "import_batch" ("id" SERIAL NOT NULL, "type" text NOT NULL, "fileName" text NOT NULL, "fileHash" text NOT NULL, "userId" integer, "userName" text NOT NULL, "created" integer NOT NULL DEFAULT \'0\', "updated" integer NOT NULL DEFAULT \'0\', "unchanged" integer NOT NULL DEFAULT \'0\', "rejected" integer NOT NULL DEFAULT \'0\', "validRowsOnly" boolean NOT NULL DEFAULT false, "status" text NOT NULL DEFAULT \'committed\', "revertedAt" TIMESTAMP, "revertedByName" text, "createdAt" TIMESTAMP NOT NULL DEFAULT now(), CONSTRAINT "PK_f408daa3bbc77ffc37eca041312" PRIMARY KEY ("id"))',
    )
    await queryRunner.query('CREATE INDEX "IDX_4eb048ac3cc8ea7b9bc4bd979d" ON "import_batch"  ("status") ')
    await queryRunner.query(
      'CREATE TABLE "import_change" ("id" SERIAL NOT NULL, "batchId" integer NOT NULL, "recordType" text NOT NULL, "recordId" integer NOT NULL, "action" text NOT NULL, "previousBatchId" integer, "previousValues" text NOT NULL, CONSTRAINT "PK_4ec4e29f6c6086cae5d2e48be12" PRIMARY KEY ("id"))',
    )
    await queryRunner.query('CREATE INDEX "IDX_e4701001339f15ebcfd426809e" ON "import_change"  ("batchId") ')
    await queryRunner.query('CREATE INDEX "IDX_8a35f61c9b4bb15a371500420d" ON "import_change"  ("previousBatchId") ')
    await queryRunner.query(
      'CREATE TABLE "modification" ("id" SERIAL NOT NULL, "name" text NOT NULL, "title" text NOT NULL, "summary" text NOT NULL DEFAULT \'\', "steps" text NOT NULL, "extraParts" text NOT NULL, "consumables" text NOT NULL, "skillLevel" text NOT NULL DEFAULT \'skilled\', "timeMinutes" integer, "cautions" text NOT NULL, "status" text NOT NULL DEFAULT \'approved\', "source" text NOT NULL DEFAULT \'editor\', "batchId" integer, "createdAt" TIMESTAMP NOT NULL DEFAULT now(), "updatedAt" TIMESTAMP NOT NULL DEFAULT now(), CONSTRAINT "UQ_a83c62ad6f326e3befb0d666d8e" UNIQUE ("name"), CONSTRAINT "PK_781d44d22be280938b475b26d9f" PRIMARY KEY ("id"))',
    )
    await queryRunner.query('CREATE INDEX "IDX_1b2bd76f348931f837ec2de455" ON "modification"  ("batchId") ')
    await queryRunner.query(
      'CREATE TABLE "link" ("id" SERIAL NOT NULL, "partAId" integer NOT NULL, "partBId" integer NOT NULL, "relation" text NOT NULL, "note" text NOT NULL DEFAULT \'\', "source" text NOT NULL, "batchId" integer, "status" text NOT NULL DEFAULT \'approved\', "createdAt" TIMESTAMP NOT NULL DEFAULT now(), "updatedAt" TIMESTAMP NOT NULL DEFAULT now(), CONSTRAINT "CHK_ef39ba5a45945e4fd0a69e4933" CHECK ("partAId" < "partBId"), CONSTRAINT "PK_26206fb7186da72fbb9eaa3fac9" PRIMARY KEY ("id"))',
    )
    await queryRunner.query('CREATE INDEX "IDX_e6d0e76ec9e40e16f8b992c1d9" ON "link"  ("partBId") ')
    await queryRunner.query('CREATE INDEX "IDX_c065da8a27052f5ec67b417334" ON "link"  ("batchId") ')
    await queryRunner.query('CREATE INDEX "IDX_53afda4c99a26dae97a8c0248e" ON "link"  ("status") ')
    await queryRunner.query('CREATE UNIQUE INDEX "IDX_fce1a71e316230e96a57e009c2" ON "link"  ("partAId", "partBId") ')
    await queryRunner.query(
      'CREATE TABLE "part_mark" ("id" SERIAL NOT NULL, "partId" integer NOT NULL, "type" text NOT NULL, "value" text NOT NULL, "valueKey" text NOT NULL, CONSTRAINT "PK_71327c5c1cb01036a6f7ca73749" PRIMARY KEY ("id"))',
    )
    await queryRunner.query('CREATE INDEX "IDX_5b1f97c3c03d5547322fd4786d" ON "part_mark"  ("valueKey") ')
    await queryRunner.query('CREATE UNIQUE INDEX "IDX_44cbecadcea4fc794ef990b721" ON "part_mark"  ("partId", "type", "value") ')
    await queryRunner.query(
      'CREATE TABLE "session" ("expiredAt" bigint NOT NULL, "id" character varying(255) NOT NULL, "json" text NOT NULL, "destroyedAt" TIMESTAMP, CONSTRAINT "PK_f55da76ac1c3ac420f444d2ff11" PRIMARY KEY ("id"))',
    )
    await queryRunner.query('CREATE INDEX "IDX_28c5d1d16da7908c97c9bc2f74" ON "session"  ("expiredAt") ')
    await queryRunner.query(
      'CREATE TABLE "link_modification" ("linkId" integer NOT NULL, "modificationId" integer NOT NULL, CONSTRAINT "PK_a2004c729148ac2071247384540" PRIMARY KEY ("linkId", "modificationId"))',
    )
    await queryRunner.query('CREATE INDEX "IDX_4504a2da59cdd9886187657802" ON "link_modification"  ("linkId") ')
    await queryRunner.query('CREATE INDEX "IDX_62736e7d3c5097bd7a4c11ec11" ON "link_modification"  ("modificationId") ')
    await queryRunner.query(
      'ALTER TABLE "build_sheet" ADD CONSTRAINT "FK_540bb6362dd999a52e5d10b9938" FOREIGN KEY ("ownerId") REFERENCES "user"("id") ON DELETE CASCADE ON UPDATE NO ACTION',
    )
    await queryRunner.query(
      'ALTER TABLE "part_identity" ADD CONSTRAINT "FK_161b8acec8dd46a9366c9e344f7" FOREIGN KEY ("partAId") REFERENCES "part"("id") ON DELETE CASCADE ON UPDATE NO ACTION',
    )
    await queryRunner.query(
      'ALTER TABLE "part_identity" ADD CONSTRAINT "FK_42534bfd9591f74712d8b8b3aad" FOREIGN KEY ("partBId") REFERENCES "part"("id") ON DELETE CASCADE ON UPDATE NO ACTION',
    )
    await queryRunner.query(
      'ALTER TABLE "import_change" ADD CONSTRAINT "FK_e4701001339f15ebcfd426809e9" FOREIGN KEY ("batchId") REFERENCES "import_batch"("id") ON DELETE CASCADE ON UPDATE NO ACTION',
    )
    await queryRunner.query(
      'ALTER TABLE "link" ADD CONSTRAINT "FK_dca46d8fa93a54d15ed6be4bdb8" FOREIGN KEY ("partAId") REFERENCES "part"("id") ON DELETE CASCADE ON UPDATE NO ACTION',
    )
    await queryRunner.query(
      'ALTER TABLE "link" ADD CONSTRAINT "FK_e6d0e76ec9e40e16f8b992c1d9b" FOREIGN KEY ("partBId") REFERENCES "part"("id") ON DELETE CASCADE ON UPDATE NO ACTION',
    )
    await queryRunner.query(
      'ALTER TABLE "part_mark" ADD CONSTRAINT "FK_98319f8fa1842a6b63223ef550c" FOREIGN KEY ("partId") REFERENCES "part"("id") ON DELETE CASCADE ON UPDATE NO ACTION',
    )
    await queryRunner.query(
      'ALTER TABLE "link_modification" ADD CONSTRAINT "FK_4504a2da59cdd98861876578020" FOREIGN KEY ("linkId") REFERENCES "link"("id") ON DELETE CASCADE ON UPDATE CASCADE',
    )
    await queryRunner.query(
      'ALTER TABLE "link_modification" ADD CONSTRAINT "FK_62736e7d3c5097bd7a4c11ec11f" FOREIGN KEY ("modificationId") REFERENCES "modification"("id") ON DELETE CASCADE ON UPDATE CASCADE',
    )
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query('ALTER TABLE "link_modification" DROP CONSTRAINT "FK_62736e7d3c5097bd7a4c11ec11f"')
    await queryRunner.query('ALTER TABLE "link_modification" DROP CONSTRAINT "FK_4504a2da59cdd98861876578020"')
    await queryRunner.query('ALTER TABLE "part_mark" DROP CONSTRAINT "FK_98319f8fa1842a6b63223ef550c"')
    await queryRunner.query('ALTER TABLE "link" DROP CONSTRAINT "FK_e6d0e76ec9e40e16f8b992c1d9b"')
    await queryRunner.query('ALTER TABLE "link" DROP CONSTRAINT "FK_dca46d8fa93a54d15ed6be4bdb8"')
    await queryRunner.query('ALTER TABLE "import_change" DROP CONSTRAINT "FK_e4701001339f15ebcfd426809e9"')
    await queryRunner.query('ALTER TABLE "part_identity" DROP CONSTRAINT "FK_42534bfd9591f74712d8b8b3aad"')
    await queryRunner.query('ALTER TABLE "part_identity" DROP CONSTRAINT "FK_161b8acec8dd46a9366c9e344f7"')
    await queryRunner.query('ALTER TABLE "build_sheet" DROP CONSTRAINT "FK_540bb6362dd999a52e5d10b9938"')
    await queryRunner.query('DROP INDEX "public"."IDX_62736e7d3c5097bd7a4c11ec11"')
    await queryRunner.query('DROP INDEX "public"."IDX_4504a2da59cdd9886187657802"')
    await queryRunner.query('DROP TABLE "link_modification"')
    await queryRunner.query('DROP INDEX "public"."IDX_28c5d1d16da7908c97c9bc2f74"')
    await queryRunner.query('DROP TABLE "session"')
    await queryRunner.query('DROP INDEX "public"."IDX_44cbecadcea4fc794ef990b721"')
    await queryRunner.query('DROP INDEX "public"."IDX_5b1f97c3c03d5547322fd4786d"')
    await queryRunner.query('DROP TABLE "part_mark"')
    await queryRunner.query('DROP INDEX "public"."IDX_fce1a71e316230e96a57e009c2"')
    await queryRunner.query('DROP INDEX "public"."IDX_53afda4c99a26dae97a8c0248e"')
    await queryRunner.query('DROP INDEX "public"."IDX_c065da8a27052f5ec67b417334"')
    await queryRunner.query('DROP INDEX "public"."IDX_e6d0e76ec9e40e16f8b992c1d9"')
    await queryRunner.query('DROP TABLE "link"')
    await queryRunner.query('DROP INDEX "public"."IDX_1b2bd76f348931f837ec2de455"')
    await queryRunner.query('DROP TABLE "modification"')
    await queryRunner.query('DROP INDEX "public"."IDX_8a35f61c9b4bb15a371500420d"')
    await queryRunner.query('DROP INDEX "public"."IDX_e4701001339f15ebcfd426809e"')
    await queryRunner.query('DROP TABLE "import_change"')
    await queryRunner.query('DROP INDEX "public"."IDX_4eb048ac3cc8ea7b9bc4bd979d"')
    await queryRunner.query('DROP TABLE "import_batch"')
    await queryRunner.query('DROP INDEX "public"."IDX_998ce2b7a2198109237a14f5fc"')
    await queryRunner.query('DROP INDEX "public"."IDX_05ccda2089f43c89c46f993230"')
    await queryRunner.query('DROP INDEX "public"."IDX_42534bfd9591f74712d8b8b3aa"')
    await queryRunner.query('DROP TABLE "part_identity"')
    await queryRunner.query('DROP INDEX "public"."IDX_001d0a95bd9ebd39b1635a6567"')
    await queryRunner.query('DROP INDEX "public"."IDX_a04370ac35038b3ae60e48868f"')
    await queryRunner.query('DROP INDEX "public"."IDX_b8f82d97f1123fff02a8f9bf86"')
    await queryRunner.query('DROP INDEX "public"."IDX_0e7d72b06bd86b591224e1ab93"')
    await queryRunner.query('DROP TABLE "part"')
    await queryRunner.query('DROP INDEX "public"."IDX_540bb6362dd999a52e5d10b993"')
    await queryRunner.query('DROP TABLE "build_sheet"')
    await queryRunner.query('DROP TABLE "user"')
    await queryRunner.query('DROP TABLE "app_setting"')
  }
}
