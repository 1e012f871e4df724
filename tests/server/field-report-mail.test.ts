import { readdirSync, readFileSync } from 'node:fs'
import path from 'node:path'
import { afterEach, describe, expect, it } from 'vitest'
import { createTestApp, type TestApp } from '../helpers/test-app'

let t: TestApp
afterEach(() => t.close())

const PAIR = { from: 'TM-HD-2000', to: 'TM-BL-1800', relation: 'fits-with-modification', modifications: ['oil-restrictor-fit'] }

/** The messages the local SMTP fake took in, as raw .eml text. */
function received(): string[] {
  let names: string[]
  try {
    names = readdirSync(t.config.mailDir).filter((name) => name.endsWith('.eml'))
  } catch {
    return []
  }
  return names.sort().map((name) => readFileSync(path.join(t.config.mailDir, name), 'utf8'))
}

async function fileReport(agent: Awaited<ReturnType<TestApp['signIn']>>) {
  const response = await agent.post('/api/field-reports').field('report', JSON.stringify({ pairs: [PAIR] }))
  expect(response.status).toBe(201)
  return response.body.id as number
}

describe('mail about field reports, through a real SMTP conversation with the local fake', () => {
  it('tells the reporter an editor asked for more and then approved, each as its own message', async () => {
    t = await createTestApp()
    const tech = await t.signIn('tech')
    const editor = await t.signIn('editor')
    const id = await fileReport(tech)
    await editor.post(`/api/field-reports/${id}/ask`).send({ question: 'Which bolt had the washers?' })
    // Queued, not sent, while the request runs.
    expect(received()).toEqual([])
    expect(await t.services.outbox.deliverDue()).toBe(1)
    await editor.post(`/api/field-reports/${id}/approve`).send({ note: 'Thanks, clear photos.' })
    expect(await t.services.outbox.deliverDue()).toBe(1)

    const [asked, approved] = received()
    expect(asked).toMatch(/^To: tech@fitwright\.test/m)
    expect(asked).toMatch(new RegExp(`^Subject: Field report #${id} needs more from you`, 'm'))
    expect(asked).toContain('Which bolt had the washers?')
    expect(approved).toMatch(new RegExp(`^Subject: Field report #${id} approved`, 'm'))
    expect(approved).toContain(`/field-reports/${id}`)
    // Plain text and HTML both.
    expect(approved).toContain('text/plain')
    expect(approved).toContain('text/html')
    const admin = await t.signIn('admin')
    const outbox = (await admin.get('/api/admin/mail')).body
    expect(outbox.items.map((m: { status: string }) => m.status)).toEqual(['sent', 'sent'])
    expect((await editor.get('/api/admin/mail')).status).toBe(403)
  })

  it('sends editors one digest of waiting reports an hour at most', async () => {
    t = await createTestApp()
    const tech = await t.signIn('tech')
    await fileReport(tech)
    await fileReport(tech)
    const sentTo = await t.services.fieldReportNotices.digest()
    expect(sentTo).toBeGreaterThan(0)
    await fileReport(tech)
    expect(await t.services.fieldReportNotices.digest()).toBe(0)
    await t.services.outbox.deliverDue()
    const digests = received().filter((message) => /^Subject: 2 field reports wait for review/m.test(message))
    expect(digests).toHaveLength(sentTo)
    expect(digests.some((message) => /^To: editor@fitwright\.test/m.test(message))).toBe(true)
  })

  it('keeps a message an SMTP server refuses, retries it later and shows the error to an admin', async () => {
    // Nothing listens on port 9 of loopback: the connection is refused.
    t = await createTestApp({ env: { FITWRIGHT_SMTP_URL: 'smtp://127.0.0.1:9' } })
    const tech = await t.signIn('tech')
    const editor = await t.signIn('editor')
    const id = await fileReport(tech)
    const rejected = await editor.post(`/api/field-reports/${id}/reject`).send({ reason: 'No photos.' })
    expect(rejected.status).toBe(200)
    expect(await t.services.outbox.deliverDue()).toBe(0)
    const admin = await t.signIn('admin')
    const [message] = (await admin.get('/api/admin/mail')).body.items
    expect(message).toMatchObject({ status: 'queued', attempts: 1, recipient: 'tech@fitwright.test' })
    expect(message.lastError).not.toBe('')
    expect(new Date(message.nextAttemptAt).getTime()).toBeGreaterThan(Date.now())
    // Not due again yet: the next run leaves it alone.
    expect(await t.services.outbox.deliverDue()).toBe(0)
    expect((await admin.get('/api/admin/mail')).body.items[0].attempts).toBe(1)
  })
})
