import type { Database, SqlValue } from '../db/database'
import type { FieldError } from '../../shared/schemas/errors'
import { AppError } from '../errors/app-error'
import type { ImportRecordType } from './import-change.entity'
import type { PreviousRows } from './change-log'
import { rewritePartWords } from '../catalogue/part-word-writer'
import type { Touched } from '../imports/import-jobs'
import { findBlockers, findQuoteBlockers } from './revert-blockers'
import { jobNumber } from '../../shared/quote-job-number'
import { toIsoTime } from '../db/database'

type ChangeRow = { recordType: ImportRecordType; recordId: number; action: 'updated' | 'deleted'; previousValues: string }

const TABLES: Record<ImportRecordType, { table: string; children: Record<string, string> }> = {
  part: { table: 'part', children: { part_mark: 'partId' } },
  link: { table: 'link', children: { link_modification: 'linkId' } },
  identity: { table: 'part_identity', children: {} },
  vehicle: { table: 'vehicle_application', children: { vehicle_original: 'vehicleId' } },
  stock: { table: 'stock_item', children: {} },
}
const COLUMN = /^[A-Za-z]+$/

/** Rows a revert would write back that point at a part or modification gone since (its batch was reverted). */
async function missingReferences(db: Database, changes: { type: ImportRecordType; rows: PreviousRows }[]): Promise<string[]> {
  const partExists = (id: unknown) => db.get('SELECT 1 AS "found" FROM part WHERE "id" = ?', [Number(id)])
  const modificationExists = (id: unknown) => db.get('SELECT 1 AS "found" FROM modification WHERE "id" = ?', [Number(id)])
  const missing: string[] = []
  for (const { type, rows } of changes) {
    if (type === 'part') continue
    const main = rows[TABLES[type].table]?.[0] ?? {}
    const partColumns = type === 'stock' ? ['partId'] : type === 'vehicle' ? [] : ['partAId', 'partBId']
    const partIds = [...partColumns.map((column) => main[column]), ...(rows.vehicle_original ?? []).map((original) => original.partId)]
    for (const id of partIds) {
      if (!(await partExists(id))) missing.push(`part id ${String(id)}`)
    }
    for (const mod of rows.link_modification ?? []) {
      if (!(await modificationExists(mod.modificationId))) missing.push(`modification id ${String(mod.modificationId)}`)
    }
  }
  return [...new Set(missing)]
}

function restorer(db: Database) {
  const run = async (sql: string, values: unknown[]) => {
    await db.run(sql, values as SqlValue[])
  }
  const insert = (table: string, row: Record<string, unknown>) => {
    const columns = Object.keys(row).filter((column) => COLUMN.test(column))
    return run(
      `INSERT INTO ${table} (${columns.map((c) => `"${c}"`).join(', ')}) VALUES (${columns.map(() => '?').join(', ')})`,
      columns.map((c) => row[c]),
    )
  }
  return async (type: ImportRecordType, recordId: number, action: 'updated' | 'deleted', previous: PreviousRows) => {
    const { table, children } = TABLES[type]
    const main = previous[table]?.[0]
    if (!main) throw new Error(`Change of ${type} ${recordId} has no previous row`)
    if (action === 'updated') {
      const columns = Object.keys(main).filter((column) => COLUMN.test(column) && column !== 'id')
      await run(`UPDATE ${table} SET ${columns.map((c) => `"${c}" = ?`).join(', ')} WHERE "id" = ?`, [
        ...columns.map((c) => main[c]),
        recordId,
      ])
      for (const [child, key] of Object.entries(children)) await run(`DELETE FROM ${child} WHERE "${key}" = ?`, [recordId])
    } else {
      await insert(table, main)
    }
    for (const child of Object.keys(children)) for (const row of previous[child] ?? []) await insert(child, row)
  }
}

/**
 * Puts back the catalogue as it was before the batch: records it updated get
 * their previous rows, records it created go, records it deleted return (with
 * their ids). Inside the caller's transaction. Answers the parts,
 * links and identities it touched, for the fit graph index, and the parts
 * whose shelves it changed, for the stock index.
 */
export async function revertBatch(db: Database, batchId: number, userName: string): Promise<Touched> {
  const batch = await db.get<{ status: string }>('SELECT "status" FROM import_batch WHERE "id" = ?', [batchId])
  if (!batch) throw AppError.notFound(`No import batch ${batchId}.`)
  if (batch.status === 'reverted') throw new AppError(409, 'already_reverted', `Batch ${batchId} is already reverted.`)

  const quoted = await findQuoteBlockers(db, batchId)
  if (quoted.length) {
    const details: FieldError[] = quoted.map((quote) => {
      const job = jobNumber({ id: quote.quoteId, createdAt: toIsoTime(quote.createdAt) })
      const whom = quote.customer ? ` for ${quote.customer}` : ''
      return {
        path: `quote ${job}`,
        message: `The ${quote.status} quote ${job}${whom} names a unit of ${quote.partNumber} this batch wrote.`,
      }
    })
    throw new AppError(
      409,
      'revert_blocked',
      `${details[0]!.message} The customer was quoted that unit, so the batch cannot be reverted while the quote stands.`,
      details,
    )
  }

  const blockers = await findBlockers(db, batchId)
  if (blockers.length) {
    const details: FieldError[] = blockers.map((b) => ({
      path: b.batchId ? `batch ${b.batchId}` : 'outside imports',
      message: b.batchId ? `Batch ${b.batchId} (${b.fileName ?? 'unknown file'}) ${b.what}.` : `A record made outside imports ${b.what}.`,
    }))
    const later = blockers.find((b) => b.batchId)
    const message = later
      ? `Batch ${later.batchId} (${later.fileName}) came later and touches what this batch wrote; revert it first.`
      : `${details[0]!.message} Remove it first.`
    throw new AppError(409, 'revert_blocked', message, details)
  }

  const changes = (
    await db.all<ChangeRow>(
      'SELECT "recordType", "recordId", "action", "previousValues" FROM import_change WHERE "batchId" = ? ORDER BY "id"',
      [batchId],
    )
  ).map((change) => ({ ...change, type: change.recordType, rows: JSON.parse(change.previousValues) as PreviousRows }))
  const missing = await missingReferences(db, changes)
  if (missing.length) {
    throw new AppError(
      409,
      'revert_blocked',
      `The records this batch replaced point at ${missing.join(', ')}, removed since by another revert, so they cannot be put back exactly.`,
    )
  }
  const ids = (table: string) => db.column(`SELECT "id" FROM ${table} WHERE "batchId" = ?`, [batchId])
  const changed = (type: ImportRecordType) => changes.filter((change) => change.type === type).map((change) => change.recordId)
  const catalogue = {
    parts: [...(await ids('part')), ...changed('part')],
    links: [...(await ids('link')), ...changed('link')],
    identities: [...(await ids('part_identity')), ...changed('identity')],
  }
  const stockParts = new Set(await db.column('SELECT "partId" FROM stock_item WHERE "batchId" = ?', [batchId]))
  for (const change of changes) if (change.type === 'stock') stockParts.add(Number(change.rows.stock_item?.[0]?.partId))
  const restore = restorer(db)
  for (const change of changes) if (change.action === 'updated') await restore(change.type, change.recordId, 'updated', change.rows)
  // A field report's approval goes back to the queue with the links it wrote or confirmed.
  await db.run('DELETE FROM field_report_link WHERE "batchId" = ?', [batchId])
  await db.run(
    `UPDATE field_report SET "status" = 'submitted', "batchId" = NULL, "decidedByName" = NULL, "decidedAt" = NULL, "decisionNote" = '' WHERE "batchId" = ?`,
    [batchId],
  )
  await db.run('DELETE FROM vehicle_original WHERE "vehicleId" IN (SELECT "id" FROM vehicle_application WHERE "batchId" = ?)', [batchId])
  for (const table of ['stock_item', 'vehicle_application', 'link', 'part_identity', 'part', 'modification'])
    await db.run(`DELETE FROM ${table} WHERE "batchId" = ?`, [batchId])
  for (const change of changes) if (change.action === 'deleted') await restore(change.type, change.recordId, 'deleted', change.rows)
  await rewritePartWords(db, changed('part'))
  await db.run(`UPDATE import_batch SET "status" = 'reverted', "revertedAt" = ?, "revertedByName" = ? WHERE "id" = ?`, [
    new Date(),
    userName,
    batchId,
  ])
  return { catalogue, stockParts: [...stockParts] }
}
