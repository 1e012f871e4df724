import { ref } from 'vue'
import type { FieldReport } from '@shared/schemas/field-reports'
import { ApiError } from '@/api/http'
import { fieldReportsApi, type Approval } from '@/api/fieldReports'
import { useRemote } from './useRemote'

export type Decision = { kind: 'approve'; note: string } | { kind: 'reject'; reason: string } | { kind: 'ask'; question: string }

/** One field report, and an editor's decision on it. */
export function useFieldReport(id: () => number) {
  const report = useRemote<FieldReport>()
  const deciding = ref(false)
  const decisionError = ref<ApiError | null>(null)

  const load = () => report.run((signal) => fieldReportsApi.get(id(), signal))

  async function decide(decision: Decision): Promise<{ report: FieldReport; approval?: Approval } | null> {
    deciding.value = true
    decisionError.value = null
    try {
      if (decision.kind === 'approve') {
        const approval = await fieldReportsApi.approve(id(), decision.note)
        report.data.value = approval.report
        return { report: approval.report, approval }
      }
      const updated =
        decision.kind === 'reject'
          ? await fieldReportsApi.reject(id(), decision.reason)
          : await fieldReportsApi.ask(id(), decision.question)
      report.data.value = updated
      return { report: updated }
    } catch (error) {
      decisionError.value = error instanceof ApiError ? error : new ApiError(0, 'client', String(error))
      return null
    } finally {
      deciding.value = false
    }
  }

  return { ...report, load, decide, deciding, decisionError }
}
