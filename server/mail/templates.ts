export type MessageContent = { subject: string; text: string; html: string }

const escape = (value: string) =>
  value.replace(/[&<>"']/g, (c) => ({ '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;', "'": '&#39;' })[c]!)

/**
 * One message in plain text and HTML from the same lines: a greeting, the
 * paragraphs, a link back into Fitwright, and the product's name at the foot.
 */
export function composeMessage(input: {
  subject: string
  greeting: string
  paragraphs: string[]
  link: { label: string; url: string }
}): MessageContent {
  const text = [
    input.greeting,
    '',
    ...input.paragraphs.flatMap((p) => [p, '']),
    `${input.link.label}: ${input.link.url}`,
    '',
    '-- ',
    'Fitwright',
  ].join('\n')
  const html = [
    '<!doctype html><html><body style="font-family: sans-serif; line-height: 1.5">',
    `<p>${escape(input.greeting)}</p>`,
    ...input.paragraphs.map((p) => `<p>${escape(p)}</p>`),
    `<p><a href="${escape(input.link.url)}">${escape(input.link.label)}</a></p>`,
    '<p style="color: #666">Fitwright</p>',
    '</body></html>',
  ].join('\n')
  return { subject: input.subject, text, html }
}
