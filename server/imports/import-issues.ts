import type { ImportIssue } from '../../shared/schemas/imports'
import type { FieldError } from '../../shared/schemas/errors'

/** Row problems of one file; a row with any problem is rejected whole. */
export class RowIssues {
  private readonly list: ImportIssue[] = []
  readonly rows = new Set<number>()

  add(row: number, column: string, message: string) {
    this.list.push({ row, column, message })
    this.rows.add(row)
  }

  has(row: number): boolean {
    return this.rows.has(row)
  }

  /** Rejected rows. */
  get count(): number {
    return this.rows.size
  }

  /** A copy to add the catalogue's findings to, leaving the file's own issues as they were. */
  clone(): RowIssues {
    const copy = new RowIssues()
    for (const issue of this.list) copy.add(issue.row, issue.column, issue.message)
    return copy
  }

  sorted(): ImportIssue[] {
    return [...this.list].sort((a, b) => a.row - b.row)
  }
}

/** Where an issue is, as the error answer's field path. */
export function issueDetails(issues: ImportIssue[]): FieldError[] {
  return issues.map((issue) => ({
    path: issue.column ? `row ${issue.row}, ${issue.column}` : `row ${issue.row}`,
    message: issue.message,
  }))
}
