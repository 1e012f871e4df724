import type { Database } from '../db/database'
import type { ImportRecordType } from './import-change.entity'

export type Blocker = { batchId: number | null; fileName: string | null; what: string }

/** `@batch` in `sql` as `?` placeholders, each bound to the batch id. */
function forBatch(sql: string, batchId: number): [string, number[]] {
  const parts = sql.split('@batch')
  return [parts.join('?'), parts.slice(1).map(() => batchId)]
}

/** Later writes that lean on what the batch wrote; while any is in place the batch cannot be undone exactly. */
export async function findBlockers(db: Database, batchId: number): Promise<Blocker[]> {
  const created = (type: ImportRecordType, table: string) =>
    `SELECT "id" FROM ${table} WHERE "batchId" = @batch AND "id" NOT IN
       (SELECT "recordId" FROM import_change WHERE "batchId" = @batch AND "recordType" = '${type}')`
  const outside = (alias: string) => `(${alias}."batchId" IS NULL OR ${alias}."batchId" != @batch)`
  const sql = `
    SELECT c."batchId" AS "batchId", 'changed records this batch wrote' AS "what" FROM import_change c
      JOIN import_batch b ON b."id" = c."batchId" WHERE c."previousBatchId" = @batch AND b."status" = 'committed'
    UNION SELECT l."batchId", 'links parts this batch added' FROM link l
      WHERE ${outside('l')} AND (l."partAId" IN (${created('part', 'part')}) OR l."partBId" IN (${created('part', 'part')}))
    UNION SELECT i."batchId", 'declares parts this batch added identical' FROM part_identity i
      WHERE ${outside('i')} AND (i."partAId" IN (${created('part', 'part')}) OR i."partBId" IN (${created('part', 'part')}))
    UNION SELECT l."batchId", 'uses modifications this batch proposed' FROM link_modification lm
      JOIN link l ON l."id" = lm."linkId" JOIN modification m ON m."id" = lm."modificationId"
      WHERE m."batchId" = @batch AND ${outside('l')}
    UNION SELECT e."batchId", 'counts field reports on links this batch added' FROM field_report_link e
      WHERE e."batchId" != @batch AND e."linkId" IN (${created('link', 'link')})
    UNION SELECT v."batchId", 'names parts this batch added as a vehicle''s original parts' FROM vehicle_original o
      JOIN vehicle_application v ON v."id" = o."vehicleId" WHERE ${outside('v')} AND o."partId" IN (${created('part', 'part')})
    UNION SELECT s."batchId", 'puts parts this batch added on the shelf' FROM stock_item s
      WHERE ${outside('s')} AND s."partId" IN (${created('part', 'part')})
    UNION SELECT NULL, 'changed a unit this batch wrote since (sold, reserved or edited at the counter)' FROM stock_item s
      JOIN import_batch sb ON sb."id" = s."batchId" WHERE s."batchId" = @batch AND s."updatedAt" != sb."createdAt"`
  const rows = await db.all<Blocker>(
    ...forBatch(`SELECT x."batchId", x."what", b."fileName" FROM (${sql}) x LEFT JOIN import_batch b ON b."id" = x."batchId"`, batchId),
  )
  return rows.sort((a, b) => (b.batchId ?? 0) - (a.batchId ?? 0))
}

export type QuoteBlocker = { quoteId: number; status: string; customer: string; createdAt: string | Date; partNumber: string }

/**
 * Draft and accepted quotes that name a unit the revert would remove or put
 * back: the customer was quoted that unit, so it stays as it is. Read through
 * quote_unit by the batch's units, never through the quotes' bodies.
 */
export function findQuoteBlockers(db: Database, batchId: number): Promise<QuoteBlocker[]> {
  return db.all<QuoteBlocker>(
    ...forBatch(
      `SELECT DISTINCT q."id" AS "quoteId", q."status", q."customer", q."createdAt", p."partNumber" FROM stock_item s
         JOIN quote_unit u ON u."stockItemId" = s."id" JOIN quote q ON q."id" = u."quoteId" JOIN part p ON p."id" = s."partId"
         WHERE q."status" IN ('draft', 'accepted') AND (s."batchId" = @batch OR s."id" IN
           (SELECT "recordId" FROM import_change WHERE "batchId" = @batch AND "recordType" = 'stock'))
         ORDER BY q."id" LIMIT 20`,
      batchId,
    ),
  )
}
