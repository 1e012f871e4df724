import { afterEach, describe, expect, it } from 'vitest'
import { anonymous, createTestApp, type TestApp } from '../helpers/test-app'
import { passwordLink, receivedMail } from '../helpers/mailbox'

let t: TestApp
afterEach(() => t.close())

describe('GET /api/admin/mail, the outbox an administrator reads', { timeout: 30_000 }, () => {
  it('shows a queued link cut short, delivers it whole, and keeps no working link once sent', async () => {
    t = await createTestApp()
    const admin = await t.signIn('admin')
    await (await anonymous(t.app)).post('/api/auth/forgot-password').send({ email: 'tech@fitwright.test' })
    await t.services.accounts.resetsQueued()
    const [queued] = (await admin.get('/api/admin/mail')).body.items
    expect(queued).toMatchObject({ kind: 'password-reset', status: 'queued', attempts: 0, recipient: 'tech@fitwright.test' })
    expect(queued.subject).toBe('Set a new Fitwright password')
    expect(queued.text).toContain('/set-password#token=(removed)')

    await t.services.outbox.deliverDue()
    const { token } = passwordLink(receivedMail(t.config.mailDir)[0]!)
    const stored: { text: string; html: string }[] = await t.dataSource.query('SELECT "text", "html" FROM mail_outbox')
    expect(JSON.stringify(stored)).not.toContain(token)
    // The link in the mail still works: only the outbox's copy was cut.
    expect((await (await anonymous(t.app)).post('/api/auth/password-link').send({ token })).status).toBe(200)
  })

  it('lists one status at a time and refuses an unknown one', async () => {
    t = await createTestApp({ env: { FITWRIGHT_SMTP_URL: 'smtp://127.0.0.1:9' } })
    const admin = await t.signIn('admin')
    await admin.post('/api/users/invite').send({ email: 'one@shop.test', name: 'One', role: 'tech' })
    await t.services.outbox.deliverDue()
    const queued = (await admin.get('/api/admin/mail?status=queued')).body
    expect(queued.total).toBe(1)
    expect(queued.items[0]).toMatchObject({ recipient: 'one@shop.test', attempts: 1 })
    expect(queued.items[0].lastError).not.toBe('')
    expect((await admin.get('/api/admin/mail?status=sent')).body).toEqual({ items: [], total: 0 })
    const bad = await admin.get('/api/admin/mail?status=lost')
    expect(bad.status).toBe(400)
    expect(bad.body.error.details[0].path).toBe('status')
  })
})
