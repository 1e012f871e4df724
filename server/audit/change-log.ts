import type { Database as Port } from '../db/database'
import type { ImportCounts, ImportType } from '../../shared/schemas/imports'
import type { ImportRecordType } from './import-change.entity'

export type BatchRecord = {
  type: ImportType
  fileName: string
  fileHash: string
  user: { id: number | null; name: string }
  counts: ImportCounts
  validRowsOnly: boolean
}

const BATCH_COLUMNS = `"type", "fileName", "fileHash", "userId", "userName", "created", "updated", "unchanged", "rejected", "validRowsOnly", "status", "createdAt"`

function batchValues(batch: BatchRecord) {
  const { created, updated, unchanged, rejected } = batch.counts
  return [batch.type, batch.fileName, batch.fileHash, batch.user.id, batch.user.name, created, updated, unchanged, rejected] as const
}

/** Records a batch (an import, a hand edit, a review) and answers its id; `now` is its time, which its writes share. */
export function recordBatch(db: Port, batch: BatchRecord, now = new Date()): Promise<number> {
  return db.insert(`INSERT INTO import_batch (${BATCH_COLUMNS}) VALUES (?, ?, ?, ?, ?, ?, ?, ?, ?, ?, 'committed', ?) RETURNING "id"`, [
    ...batchValues(batch),
    batch.validRowsOnly,
    now,
  ])
}

/**
 * The rows a record had before a batch updated or deleted it, by table (the
 * record's own row and its child rows), for a revert to write back.
 */
export type PreviousRows = Record<string, Record<string, unknown>[]>

const INSERT_CHANGE = `INSERT INTO import_change ("batchId", "recordType", "recordId", "action", "previousBatchId", "previousValues") VALUES (?, ?, ?, ?, ?, ?)`

/** One record a batch changed: its type, id, what the batch did, and the rows it had before. */
type ChangeArgs = [
  recordType: ImportRecordType,
  recordId: number,
  action: 'updated' | 'deleted',
  previousBatchId: number | null,
  previous: PreviousRows,
]

const changeValues = (batchId: number, [recordType, recordId, action, previousBatchId, previous]: ChangeArgs) =>
  [batchId, recordType, recordId, action, previousBatchId, JSON.stringify(previous)] as const

/** Records, for a revert, what each record a batch changed looked like before. */
export function changeRecorder(db: Port, batchId: number) {
  return async (...change: ChangeArgs) => {
    await db.run(INSERT_CHANGE, changeValues(batchId, change))
  }
}
