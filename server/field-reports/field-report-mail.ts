import type { FieldReport } from '../../shared/schemas/field-reports'
import { composeMessage, type MessageContent } from '../mail/templates'

const OUTCOMES: Record<'approved' | 'rejected' | 'needs-more', { subject: string; lead: string }> = {
  approved: { subject: 'approved', lead: 'An editor approved your report: its pairs now count in verdicts.' },
  rejected: { subject: 'not taken', lead: 'An editor did not take your report into the catalogue.' },
  'needs-more': { subject: 'needs more from you', lead: 'An editor needs more from you before deciding on your report.' },
}

const pairsLine = (report: FieldReport) => report.pairs.map((pair) => `${pair.from} with ${pair.to}`).join('; ')

/** To the reporter, once an editor has decided. */
export function reportDecidedMessage(report: FieldReport, status: keyof typeof OUTCOMES, note: string, publicUrl: string): MessageContent {
  const outcome = OUTCOMES[status]
  const said = note ? [status === 'needs-more' ? `The question: ${note}` : `The editor wrote: ${note}`] : []
  return composeMessage({
    subject: `Field report #${report.id} ${outcome.subject}`,
    greeting: `Hello ${report.reporter.name},`,
    paragraphs: [outcome.lead, `Report #${report.id}: ${pairsLine(report)}.`, ...said],
    link: { label: 'Open the report', url: `${publicUrl}/field-reports/${report.id}` },
  })
}

/** To editors and admins: what waits for review, at most once an hour. */
export function reportsWaitingMessage(name: string, waiting: FieldReport[], publicUrl: string): MessageContent {
  const shown = waiting.slice(0, 10)
  return composeMessage({
    subject: `${waiting.length} field report${waiting.length === 1 ? '' : 's'} wait for review`,
    greeting: `Hello ${name},`,
    paragraphs: [
      'New reports from the shop floor wait for your review:',
      ...shown.map((report) => `#${report.id} from ${report.reporter.name}: ${pairsLine(report)}`),
      ...(waiting.length > shown.length ? [`…and ${waiting.length - shown.length} more.`] : []),
    ],
    link: { label: 'Open the review queue', url: `${publicUrl}/field-reports?status=submitted` },
  })
}
