import type { MigrationInterface, QueryRunner } from 'typeorm'
import { addFeedTriggers, dropFeedTriggers, type FedTable } from './change-feed-triggers'

/*
 * Written by hand (PostgreSQL only): shelves and sites join the change feed,
 * so a unit sold, held or shelved on one server shows in the others' stock
 * answers too.
 */
const TABLES: FedTable[] = [
  ['stock_item', 'stockParts', '"partId"'],
  ['site', 'sites', 'id'],
]

export class StockChangeFeed1796300000000 implements MigrationInterface {
  name = 'StockChangeFeed1796300000000'

  async up(queryRunner: QueryRunner): Promise<void> {
    await addFeedTriggers(queryRunner, TABLES)
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await dropFeedTriggers(queryRunner, TABLES)
  }
}
