import type { FieldReportStatus } from '@shared/schemas/field-reports'

export const FIELD_REPORT_STATUS_LABELS: Record<FieldReportStatus, string> = {
  submitted: 'Waiting for review',
  approved: 'Approved',
  rejected: 'Rejected',
  'needs-more': 'More asked for',
}

export const FIELD_REPORT_STATUS_SEVERITY: Record<FieldReportStatus, 'info' | 'success' | 'danger' | 'warn'> = {
  submitted: 'info',
  approved: 'success',
  rejected: 'danger',
  'needs-more': 'warn',
}
