import type { FieldChange, ImportCounts, RowChange } from '../../shared/schemas/imports'

/** Longest lists one answer carries; the counts always cover every row. */
export const LISTED = { errors: 10_000, changes: 2_000 }

/**
 * Counts what each row does and keeps the first changes to show. Building the
 * description of a new record is deferred, since a large first import would
 * otherwise build one for every row only to leave most of them out.
 */
export class ChangeList {
  readonly counts: ImportCounts = { created: 0, updated: 0, unchanged: 0, rejected: 0 }
  readonly listed: RowChange[] = []
  omitted = 0

  /** Rows that repeat an earlier row's values change nothing of their own. */
  repeats(count: number) {
    this.counts.unchanged += count
  }

  create(row: number, key: string | (() => string), fields: () => FieldChange[]) {
    this.counts.created += 1
    this.list(row, key, 'create', fields)
  }

  /** An existing record: updated when any field differs, unchanged otherwise. */
  compare(row: number, key: string, fields: FieldChange[]) {
    if (fields.length === 0) {
      this.counts.unchanged += 1
      return
    }
    this.counts.updated += 1
    this.list(row, key, 'update', () => fields)
  }

  rejected(rows: number) {
    this.counts.rejected = rows
  }

  private list(row: number, key: string | (() => string), action: RowChange['action'], fields: () => FieldChange[]) {
    if (this.listed.length >= LISTED.changes) {
      this.omitted += 1
      return
    }
    this.listed.push({ row, key: typeof key === 'string' ? key : key(), action, fields: fields() })
  }
}
