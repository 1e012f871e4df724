import type { MigrationInterface, QueryRunner } from 'typeorm'

/*
 * Written by hand (PostgreSQL only): every statement that changes parts,
 * links, their modifications or identities records the ids it touched in
 * catalogue_change and notifies the channel, in its own transaction, so other
 * servers on this database apply the change to their graph index.
 */
const TABLES: [table: string, key: string, column: string][] = [
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
    for (const [table, key, column] of TABLES) {
      for (const [operation, rows] of [
        ['INSERT', 'new_rows'],
        ['UPDATE', 'new_rows'],
        ['DELETE', 'old_rows'],
      ] as const) {
        const fn = `fitwright_${table}_${operation.toLowerCase()}_changed`
        await queryRunner.query(`CREATE FUNCTION ${fn}() RETURNS trigger LANGUAGE plpgsql AS $$
          DECLARE change_id bigint;
          BEGIN
            INSERT INTO catalogue_change ("touched")
              SELECT jsonb_build_object('${key}', jsonb_agg(DISTINCT ${column})) FROM ${rows} HAVING COUNT(*) > 0
              RETURNING "id" INTO change_id;
            IF change_id IS NOT NULL THEN PERFORM pg_notify('fitwright_catalogue', change_id::text); END IF;
            RETURN NULL;
          END $$`)
        const transition = operation === 'DELETE' ? 'OLD TABLE AS old_rows' : 'NEW TABLE AS new_rows'
        await queryRunner.query(
          `CREATE TRIGGER ${fn} AFTER ${operation} ON "${table}" REFERENCING ${transition} FOR EACH STATEMENT EXECUTE FUNCTION ${fn}()`,
        )
      }
    }
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    for (const [table] of TABLES) {
      for (const operation of ['insert', 'update', 'delete']) {
        const fn = `fitwright_${table}_${operation}_changed`
        await queryRunner.query(`DROP TRIGGER IF EXISTS ${fn} ON "${table}"`)
        await queryRunner.query(`DROP FUNCTION IF EXISTS ${fn}()`)
      }
    }
    await queryRunner.query('DROP TABLE "catalogue_change"')
  }
}
