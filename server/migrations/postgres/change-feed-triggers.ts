import type { QueryRunner } from 'typeorm'

/** One table the change feed follows: its name, the key its ids go under in "touched", and the column holding them. */
export type FedTable = [table: string, key: string, column: string]

/**
 * Statement triggers that record the ids a change touched in catalogue_change
 * and notify the channel, in the change's own transaction (shared by the
 * change-feed migrations, so every fed table records alike).
 */
export async function addFeedTriggers(queryRunner: QueryRunner, tables: readonly FedTable[]): Promise<void> {
  for (const [table, key, column] of tables) {
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

export async function dropFeedTriggers(queryRunner: QueryRunner, tables: readonly FedTable[]): Promise<void> {
  for (const [table] of tables) {
    for (const operation of ['insert', 'update', 'delete']) {
      const fn = `fitwright_${table}_${operation}_changed`
      await queryRunner.query(`DROP TRIGGER IF EXISTS ${fn} ON "${table}"`)
      await queryRunner.query(`DROP FUNCTION IF EXISTS ${fn}()`)
    }
  }
}
