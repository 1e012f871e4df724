import type Database from 'better-sqlite3'
import type { FieldError } from '../../shared/schemas/errors'
import { AppError } from '../errors/app-error'
import type { ImportRecordType } from './import-change.entity'
import { SQL_NOW, type PreviousRows } from './change-log'
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
function missingReferences(db: Database.Database, changes: { type: ImportRecordType; rows: PreviousRows }[]): string[] {
  const partExists = db.prepare('SELECT 1 FROM part WHERE id = ?')
  const modificationExists = db.prepare('SELECT 1 FROM modification WHERE id = ?')
  const missing: string[] = []
  for (const { type, rows } of changes) {
    if (type === 'part') continue
    const main = rows[TABLES[type].table]?.[0] ?? {}
    const partColumns = type === 'stock' ? ['partId'] : type === 'vehicle' ? [] : ['partAId', 'partBId']
    const partIds = [...partColumns.map((column) => main[column]), ...(rows.vehicle_original ?? []).map((original) => original.partId)]
    for (const id of partIds) {
      if (!partExists.get(id)) missing.push(`part id ${String(id)}`)
    }
    for (const mod of rows.link_modification ?? []) {
      if (!modificationExists.get(mod.modificationId)) missing.push(`modification id ${String(mod.modificationId)}`)
    }
  }
  return [...new Set(missing)]
}

function restorer(db: Database.Database) {
  const statements = new Map<string, Database.Statement>()
  const run = (sql: string, values: unknown[]) => {
    let statement = statements.get(sql)
    if (!statement) statements.set(sql, (statement = db.prepare(sql)))
    statement.run(...values)
  }
  const insert = (table: string, row: Record<string, unknown>) => {
    const columns = Object.keys(row).filter((column) => COLUMN.test(column))
    run(
      `INSERT INTO ${table} (${columns.map((c) => `"${c}"`).join(', ')}) VALUES (${columns.map(() => '?').join(', ')})`,
      columns.map((c) => row[c]),
    )
  }
  return (type: ImportRecordType, recordId: number, action: 'updated' | 'deleted', previous: PreviousRows) => {
    const { table, children } = TABLES[type]
    const main = previous[table]?.[0]
    if (!main) throw new Error(`Change of ${type} ${recordId} has no previous row`)
    if (action === 'updated') {
      const columns = Object.keys(main).filter((column) => COLUMN.test(column) && column !== 'id')
      run(`UPDATE ${table} SET ${columns.map((c) => `"${c}" = ?`).join(', ')} WHERE id = ?`, [...columns.map((c) => main[c]), recordId])
      for (const [child, key] of Object.entries(children)) run(`DELETE FROM ${child} WHERE ${key} = ?`, [recordId])
    } else {
      insert(table, main)
    }
    for (const child of Object.keys(children)) for (const row of previous[child] ?? []) insert(child, row)
  }
}

/**
 * Puts back the catalogue as it was before the batch: records it updated get
 * their previous rows, records it created go, records it deleted return (with
 * their ids). Synchronous, for the caller's transaction. Answers the parts,
 * links and identities it touched, for the fit graph index, and the parts
 * whose shelves it changed, for the stock index.
 */
export function revertBatch(db: Database.Database, batchId: number, userName: string): Touched {
  const batch = db.prepare('SELECT status FROM import_batch WHERE id = ?').get(batchId) as { status: string } | undefined
  if (!batch) throw AppError.notFound(`No import batch ${batchId}.`)
  if (batch.status === 'reverted') throw new AppError(409, 'already_reverted', `Batch ${batchId} is already reverted.`)

  const quoted = findQuoteBlockers(db, batchId)
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

  const blockers = findBlockers(db, batchId)
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
    db
      .prepare('SELECT recordType, recordId, action, previousValues FROM import_change WHERE batchId = ? ORDER BY id')
      .all(batchId) as ChangeRow[]
  ).map((change) => ({ ...change, type: change.recordType, rows: JSON.parse(change.previousValues) as PreviousRows }))
  const missing = missingReferences(db, changes)
  if (missing.length) {
    throw new AppError(
      409,
      'revert_blocked',
      `The records this batch replaced point at ${missing.join(', ')}, removed since by another revert, so they cannot be put back exactly.`,
    )
  }
  const ids = (table: string) =>
    (db.prepare(`SELECT id FROM ${table} WHERE batchId = ?`).all(batchId) as { id: number }[]).map((row) => row.id)
  const changed = (type: ImportRecordType) => changes.filter((change) => change.type === type).map((change) => change.recordId)
  const catalogue = {
    parts: [...ids('part'), ...changed('part')],
    links: [...ids('link'), ...changed('link')],
    identities: [...ids('part_identity'), ...changed('identity')],
  }
  const stockParts = new Set(
    (db.prepare('SELECT "partId" FROM stock_item WHERE "batchId" = ?').all(batchId) as { partId: number }[]).map((row) => row.partId),
  )
  for (const change of changes) if (change.type === 'stock') stockParts.add(Number(change.rows.stock_item?.[0]?.partId))
  const restore = restorer(db)
  for (const change of changes) if (change.action === 'updated') restore(change.type, change.recordId, 'updated', change.rows)
  // A field report's approval goes back to the queue with the links it wrote or confirmed.
  db.prepare('DELETE FROM field_report_link WHERE "batchId" = ?').run(batchId)
  db.prepare(
    `UPDATE field_report SET "status" = 'submitted', "batchId" = NULL, "decidedByName" = NULL, "decidedAt" = NULL, "decisionNote" = '' WHERE "batchId" = ?`,
  ).run(batchId)
  db.prepare('DELETE FROM vehicle_original WHERE "vehicleId" IN (SELECT "id" FROM vehicle_application WHERE "batchId" = ?)').run(batchId)
  for (const table of ['stock_item', 'vehicle_application', 'link', 'part_identity', 'part', 'modification'])
    db.prepare(`DELETE FROM ${table} WHERE "batchId" = ?`).run(batchId)
  for (const change of changes) if (change.action === 'deleted') restore(change.type, change.recordId, 'deleted', change.rows)
  rewritePartWords(db, changed('part'))
  db.prepare(`UPDATE import_batch SET status = 'reverted', revertedAt = ${SQL_NOW}, revertedByName = ? WHERE id = ?`).run(userName, batchId)
  return { catalogue, stockParts: [...stockParts] }
}
