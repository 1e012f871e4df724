import nodemailer, { type Transporter } from 'nodemailer'
import { startLocalSmtp, type LocalSmtp } from './local-smtp'

export type MailMessage = { to: string; subject: string; text: string; html: string }
export type MailSettings = { smtpUrl?: string; mailDir: string; from: string }

/**
 * Sends over SMTP with nodemailer: to the configured server, or to the local
 * fake, started the first time a message goes out (and stopped on close).
 */
export class Mailer {
  private transport: Promise<Transporter> | null = null
  private local: LocalSmtp | null = null

  constructor(private readonly settings: MailSettings) {}

  async send(message: MailMessage): Promise<void> {
    const transport = await this.connect()
    await transport.sendMail({ from: this.settings.from, ...message })
  }

  async close(): Promise<void> {
    const transport = await this.transport?.catch(() => null)
    transport?.close()
    await this.local?.close()
    this.transport = null
    this.local = null
  }

  private connect(): Promise<Transporter> {
    this.transport ??= (async () => {
      let url = this.settings.smtpUrl
      if (!url) {
        this.local = await startLocalSmtp(this.settings.mailDir)
        url = this.local.url
      }
      // A server that never answers must not hold a delivery run for minutes.
      return nodemailer.createTransport({ url, connectionTimeout: 5_000, greetingTimeout: 5_000, socketTimeout: 10_000 })
    })()
    this.transport.catch(() => (this.transport = null))
    return this.transport
  }
}
