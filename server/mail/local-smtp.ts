import { createWriteStream } from 'node:fs'
import { mkdir, rename, rm } from 'node:fs/promises'
import type { AddressInfo } from 'node:net'
import path from 'node:path'
import { pipeline } from 'node:stream/promises'
import { SMTPServer } from 'smtp-server'

export type LocalSmtp = { url: string; close: () => Promise<void> }

let sequence = 0

/**
 * The SMTP server Fitwright starts for itself when no real one is configured:
 * it takes every message over a real SMTP conversation on loopback and keeps
 * it as one .eml file, so the demo and the tests see real mail go through.
 */
export async function startLocalSmtp(dir: string): Promise<LocalSmtp> {
  await mkdir(dir, { recursive: true })
  const server = new SMTPServer({
    authOptional: true,
    disabledCommands: ['STARTTLS'],
    banner: 'Fitwright local mail',
    size: 25 * 1024 * 1024,
    logger: false,
    onData(stream, _session, callback) {
      const name = `${new Date().toISOString().replace(/[:.]/g, '-')}-${process.pid}-${++sequence}.eml`
      // Written under a partial name, then renamed: a reader of the folder only ever sees whole messages.
      const partial = path.join(dir, `.${name}.part`)
      pipeline(stream, createWriteStream(partial))
        .then(() => rename(partial, path.join(dir, name)))
        .then(
          () => callback(),
          (error: Error) => {
            void rm(partial, { force: true })
            callback(error)
          },
        )
    },
  })
  await new Promise<void>((resolve, reject) => {
    server.once('error', reject)
    server.listen(0, '127.0.0.1', () => resolve())
  })
  const { port } = server.server.address() as AddressInfo
  return {
    url: `smtp://127.0.0.1:${port}`,
    close: () => new Promise<void>((resolve) => server.close(() => resolve())),
  }
}
