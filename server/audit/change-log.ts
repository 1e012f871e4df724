import type Database from 'better-sqlite3'
import type { ImportCounts, ImportType } from '../../shared/schemas/imports'
import type { ImportRecordType } from './import-change.entity'

/** The time as TypeORM writes it into SQLite, so raw and TypeORM writes sort together. */
export const SQL_NOW = "strftime('%Y-%m-%d %H:%M:%f', 'now')"

export type BatchRecord = {
  type: ImportType
  fileName: string
  fileHash: string
  user: { id: number | null; name: string }
  counts: ImportCounts
  validRowsOnly: boolean
}

export function insertBatch(db: Database.Database, batch: BatchRecord): number {
  const result = db
    .prepare(
      `INSERT INTO import_batch (type, fileName, fileHash, userId, userName, created, updated, unchanged, rejected, validRowsOnly, status, createdAt)
       VALUES (?, ?, ?, ?, ?, ?, ?, ?, ?, ?, 'committed', ${SQL_NOW})`,
    )
    .run(
      batch.type,
      batch.fileName,
      batch.fileHash,
      batch.user.id,
      batch.user.name,
      batch.counts.created,
      batch.counts.updated,
      batch.counts.unchanged,
      batch.counts.rejected,
      batch.validRowsOnly ? 1 : 0,
    )
  return Number(result.lastInsertRowid)
}

/**
 * The rows a record had before a batch updated or deleted it, by table (the
 * record's own row and its child rows), for a revert to write back.
 */
export type PreviousRows = Record<string, Record<string, unknown>[]>

export function changeRecorder(db: Database.Database, batchId: number) {
  const insert = db.prepare(
    'INSERT INTO import_change (batchId, recordType, recordId, action, previousBatchId, previousValues) VALUES (?, ?, ?, ?, ?, ?)',
  )
  return (
    recordType: ImportRecordType,
    recordId: number,
    action: 'updated' | 'deleted',
    previousBatchId: number | null,
    previous: PreviousRows,
  ) => {
    insert.run(batchId, recordType, recordId, action, previousBatchId, JSON.stringify(previous))
  }
}
