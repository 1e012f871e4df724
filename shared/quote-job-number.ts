/** The job number printed on a quote: the year it was made and its number, so a customer can quote it back. */
export function jobNumber(quote: { id: number; createdAt: string }): string {
  return `${new Date(quote.createdAt).getUTCFullYear()}-${String(quote.id).padStart(5, '0')}`
}

/** The quote id in a job number as typed back ("2026-00012", "00012", "12"); null when the text is no job number. */
export function quoteIdOfJobNumber(text: string): number | null {
  const match = /^(?:\d{4}-)?0*(\d{1,9})$/.exec(text.trim())
  const id = match ? Number(match[1]) : 0
  return id > 0 ? id : null
}
