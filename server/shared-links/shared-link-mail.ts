import { composeMessage, type MessageContent } from '../mail/templates'

/** The token rides after the #, so it never reaches a server log or a Referer header (and the outbox cuts it out once sent). */
export function sharedLinkUrl(publicUrl: string, token: string): string {
  return `${publicUrl}/shared#token=${token}`
}

const WHAT = { sheet: 'build sheet', quote: 'quote' } as const

export function sharedLinkMessage(input: {
  kind: keyof typeof WHAT
  title: string
  sharedBy: string
  url: string
  days: number
  expiresAt: Date
}): MessageContent {
  const what = WHAT[input.kind]
  const until = input.expiresAt.toISOString().slice(0, 10)
  return composeMessage({
    subject: `${input.sharedBy} shared a ${what} with you: ${input.title}`,
    greeting: 'Hello,',
    paragraphs: [
      `${input.sharedBy} shared the ${what} "${input.title}" with you on Fitwright.`,
      `The link opens it read-only, without an account, for ${input.days === 1 ? 'a day' : `${input.days} days`} (until ${until}). Anyone with the link can read it, so forward it with care.`,
      'The page lists the usual cautions; the service manual, local codes and licensed practice come first.',
    ],
    link: { label: `Open the ${what}`, url: input.url },
  })
}
