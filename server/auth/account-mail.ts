import { composeMessage, type MessageContent } from '../mail/templates'
import { ROLE_LABELS, type Role } from '../../shared/schemas/auth'

/** Where a mailed token lands: after the #, so it never reaches a server log or a Referer header. */
export function passwordLinkUrl(publicUrl: string, token: string): string {
  return `${publicUrl}/set-password#token=${token}`
}

const hoursText = (hours: number) => (hours === 1 ? 'an hour' : hours % 24 === 0 ? `${hours / 24} days` : `${hours} hours`)

export function inviteMessage(input: { name: string; role: Role; invitedBy: string; url: string; validHours: number }): MessageContent {
  return composeMessage({
    subject: 'You are invited to Fitwright',
    greeting: `Hello ${input.name},`,
    paragraphs: [
      `${input.invitedBy} has made you a Fitwright account as ${ROLE_LABELS[input.role]}.`,
      `Open the link below to choose your password. It works once and for ${hoursText(input.validHours)}; after that, ask your administrator for a new invitation.`,
    ],
    link: { label: 'Choose your password', url: input.url },
  })
}

export function resetMessage(input: { name: string; url: string; validHours: number }): MessageContent {
  return composeMessage({
    subject: 'Set a new Fitwright password',
    greeting: `Hello ${input.name},`,
    paragraphs: [
      'Someone, probably you, asked to set a new password for your Fitwright account.',
      `Open the link below to choose one. It works once and for ${hoursText(input.validHours)}. If you did not ask, ignore this mail: your password stays as it is.`,
    ],
    link: { label: 'Choose a new password', url: input.url },
  })
}
