import type { MigrationInterface, QueryRunner } from 'typeorm'
import { addFeedTriggers, dropFeedTriggers, type FedTable } from './change-feed-triggers'

/*
 * Written by hand (PostgreSQL only): every statement that changes parts,
 * links, their modifications or identities records the ids it touched in
 * catalogue_change and notifies the channel, in its own transaction, so other
 * servers on this database apply the change to their graph index.
 */
const TABLES: FedTable[] = [
  ['part', 'parts', 'id'],
  ['link', 'links', 'id'],
  ['link_modification', 'links', '"linkId"'],
  ['part_identity', 'identities', 'id'],
]

export class CatalogueChangeFeed1796197600000 implements MigrationInterface {
  name = 'CatalogueChangeFeed1796197600000'

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(
      'CREATE TABLE "catalogue_change" ("id" BIGSERIAL PRIMARY KEY, "touched" jsonb NOT NULL, "createdAt" TIMESTAMP NOT NULL DEFAULT (now() AT TIME ZONE \'utc\'))',
    )
    await addFeedTriggers(queryRunner, TABLES)
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await dropFeedTriggers(queryRunner, TABLES)
    await queryRunner.query('DROP TABLE "catalogue_change"')
  }
}
