import type { FieldReportList, FieldReportStatus } from '@shared/schemas/field-reports'
import { fieldReportsApi } from '@/api/fieldReports'
import { useRemote } from './useRemote'

/** The report list: a tech's own, or every report for editors (the server decides), newest first. */
export function useFieldReports() {
  const list = useRemote<FieldReportList>()
  const load = (query: { status?: FieldReportStatus; from?: string; to?: string; page: number }) =>
    list.run((signal) => fieldReportsApi.list({ ...query, pageSize: 25 }, signal))
  return { ...list, load }
}
