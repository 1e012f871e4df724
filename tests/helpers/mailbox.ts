import { readdirSync, readFileSync } from 'node:fs'
import path from 'node:path'

/** One message the local SMTP fake kept, read back from its .eml file. */
export type ReceivedMail = { to: string; subject: string; text: string; raw: string }

function decodeQuotedPrintable(body: string): string {
  const bytes = body.replace(/=\r?\n/g, '').replace(/=([0-9A-F]{2})/gi, (_match, hex: string) => String.fromCharCode(parseInt(hex, 16)))
  return Buffer.from(bytes, 'latin1').toString('utf8')
}

function header(block: string, name: string): string {
  const unfolded = block.replace(/\r?\n[ \t]+/g, ' ')
  return new RegExp(`^${name}:\\s*(.*)$`, 'im').exec(unfolded)?.[1]?.trim() ?? ''
}

/** The plain-text part of a MIME message, decoded. */
function plainText(raw: string): string {
  const parts = raw.split(/\r?\n--[^\r\n]+\r?\n/)
  for (const part of parts) {
    const split = part.search(/\r?\n\r?\n/)
    const head = part.slice(0, split)
    if (!/^content-type:\s*text\/plain/im.test(head)) continue
    const body = part
      .slice(split)
      .replace(/^\r?\n\r?\n/, '')
      .replace(/\r?\n--[^\r\n]*--\s*$/, '')
    const encoding = header(head, 'Content-Transfer-Encoding').toLowerCase()
    if (encoding === 'quoted-printable') return decodeQuotedPrintable(body)
    if (encoding === 'base64') return Buffer.from(body.replace(/\s+/g, ''), 'base64').toString('utf8')
    return body
  }
  return ''
}

/** Every message in the fake's folder, oldest first (the file names start with the time). */
export function receivedMail(dir: string): ReceivedMail[] {
  let names: string[]
  try {
    names = readdirSync(dir).filter((name) => name.endsWith('.eml'))
  } catch {
    return []
  }
  return names.sort().map((name) => {
    const raw = readFileSync(path.join(dir, name), 'utf8')
    const head = raw.slice(0, raw.search(/\r?\n\r?\n/))
    return { to: header(head, 'To'), subject: header(head, 'Subject'), text: plainText(raw), raw }
  })
}

/** The set-password link in a message's text: its path and #token, to open on whichever port the test server has. */
export function passwordLink(mail: ReceivedMail): { url: string; pathAndHash: string; token: string } {
  const match = /(https?:\/\/[^\s/]+)(\/set-password#token=([\w-]+))/.exec(mail.text)
  if (!match) throw new Error(`No set-password link in "${mail.subject}":\n${mail.text}`)
  return { url: match[1]! + match[2]!, pathAndHash: match[2]!, token: match[3]! }
}

/** The read-only shared link in a message's text: its path and #token, to open on whichever port the test server has. */
export function sharedLink(mail: ReceivedMail): { url: string; pathAndHash: string; token: string } {
  const match = /(https?:\/\/[^\s/]+)(\/shared#token=([\w-]+))/.exec(mail.text)
  if (!match) throw new Error(`No shared link in "${mail.subject}":\n${mail.text}`)
  return { url: match[1]! + match[2]!, pathAndHash: match[2]!, token: match[3]! }
}
