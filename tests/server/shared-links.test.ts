import { createHash } from 'node:crypto'
import { afterEach, beforeEach, describe, expect, it } from 'vitest'
import { anonymous, createTestApp, type TestApp } from '../helpers/test-app'
import { receivedMail, sharedLink } from '../helpers/mailbox'

let t: TestApp
beforeEach(async () => {
  t = await createTestApp()
})
afterEach(() => t.close())

const SLOTS = { block: 'TM-BL-1800', head: 'TM-HD-2000' }

async function deliveredTo(email: string) {
  await t.services.outbox.deliverDue()
  return receivedMail(t.config.mailDir).filter((mail) => mail.to === email)
}

async function newSheet(role: 'tech' | 'editor' = 'tech') {
  const agent = await t.signIn(role)
  const response = await agent.post('/api/builds').send({ name: 'Hatchback head swap', slots: SLOTS, chassisModelYear: 1994 })
  expect(response.status, JSON.stringify(response.body)).toBe(201)
  return { agent, id: response.body.id as number }
}

describe('sharing a build sheet by mail', { timeout: 30_000 }, () => {
  it('mails one read-only link that opens the sheet with its evaluation, without an account', async () => {
    const { agent, id } = await newSheet()
    const shared = await agent.post(`/api/builds/${id}/share`).send({ email: 'Customer@Example.test', days: 3 })
    expect(shared.status, JSON.stringify(shared.body)).toBe(201)
    expect(shared.body).toMatchObject({ kind: 'sheet', recipient: 'customer@example.test' })
    const days = (Date.parse(shared.body.expiresAt) - Date.now()) / 86_400_000
    expect(days).toBeGreaterThan(2.99)
    expect(days).toBeLessThanOrEqual(3)

    const [mail, ...more] = await deliveredTo('customer@example.test')
    expect(more).toEqual([])
    expect(mail!.subject).toContain('Hatchback head swap')
    expect(mail!.text).toContain('read-only')
    expect(mail!.text).toContain('service manual')
    const { token } = sharedLink(mail!)

    const visitor = await anonymous(t.app)
    const opened = await visitor.post('/api/shared/open').send({ token })
    expect(opened.status, JSON.stringify(opened.body)).toBe(200)
    expect(opened.headers['cache-control']).toBe('no-store')
    expect(opened.body).toMatchObject({ kind: 'sheet', sharedBy: expect.any(String), sheet: { name: 'Hatchback head swap', slots: SLOTS } })
    expect(opened.body.sheet.owner).toBeUndefined()
    expect(opened.body.evaluation.verdict).toEqual(expect.any(String))
    expect(opened.body.evaluation.pairs.length).toBeGreaterThan(0)
    expect(opened.body.evaluation.cautions.length).toBeGreaterThan(0)
  })

  it('keeps only the hash of the token, and the outbox forgets the token once sent', async () => {
    const { agent, id } = await newSheet()
    await agent.post(`/api/builds/${id}/share`).send({ email: 'colleague@shop.test' })
    const { token } = sharedLink((await deliveredTo('colleague@shop.test'))[0]!)
    const rows: { tokenHash: string; kind: string; targetId: number; recipient: string }[] = await t.dataSource.query(
      'SELECT "tokenHash", "kind", "targetId", "recipient" FROM "shared_link"',
    )
    expect(rows).toEqual([
      { tokenHash: createHash('sha256').update(token).digest('hex'), kind: 'sheet', targetId: id, recipient: 'colleague@shop.test' },
    ])
    const kept: { text: string }[] = await t.dataSource.query('SELECT "text" FROM "mail_outbox" WHERE "kind" = \'shared-sheet\'')
    expect(kept[0]!.text).not.toContain(token)
  })

  it('lets nothing be changed with the link: the sheet routes still want a session', async () => {
    const { agent, id } = await newSheet()
    await agent.post(`/api/builds/${id}/share`).send({ email: 'colleague@shop.test' })
    const { token } = sharedLink((await deliveredTo('colleague@shop.test'))[0]!)
    const visitor = await anonymous(t.app)
    expect((await visitor.put(`/api/builds/${id}`).send({ name: 'Changed' })).status).toBe(401)
    expect((await visitor.get(`/api/builds/${id}`)).status).toBe(401)
    expect((await visitor.post(`/api/builds/${id}/share`).send({ email: 'x@shop.test' })).status).toBe(401)
    expect((await visitor.post('/api/shared/open').send({ token, name: 'Changed' })).status).toBe(400)
    expect((await agent.get(`/api/builds/${id}`)).body.name).toBe('Hatchback head swap')
  })

  it('refuses an expired link with 410 and an unknown one with 404', async () => {
    const { agent, id } = await newSheet()
    await agent.post(`/api/builds/${id}/share`).send({ email: 'colleague@shop.test', days: 1 })
    const { token } = sharedLink((await deliveredTo('colleague@shop.test'))[0]!)
    await t.db.run('UPDATE "shared_link" SET "expiresAt" = ?', [new Date('2000-01-01T00:00:00Z')])
    const visitor = await anonymous(t.app)
    const expired = await visitor.post('/api/shared/open').send({ token })
    expect(expired.status).toBe(410)
    expect(expired.body.error.code).toBe('link_expired')
    const unknown = await visitor.post('/api/shared/open').send({ token: `${token.slice(0, -2)}xx` })
    expect(unknown.status).toBe(404)
    expect(unknown.body.error.code).toBe('link_unknown')
    expect((await visitor.post('/api/shared/open').send({})).status).toBe(400)
  })

  it('answers 410 once the shared sheet is deleted', async () => {
    const { agent, id } = await newSheet()
    await agent.post(`/api/builds/${id}/share`).send({ email: 'colleague@shop.test' })
    const { token } = sharedLink((await deliveredTo('colleague@shop.test'))[0]!)
    expect((await agent.delete(`/api/builds/${id}`)).status).toBe(204)
    const gone = await (await anonymous(t.app)).post('/api/shared/open').send({ token })
    expect(gone.status).toBe(410)
    expect(gone.body.error.code).toBe('link_gone')
  })

  it.each([
    [{ email: 'not an address' }, 'email'],
    [{ email: 'a@shop.test', days: 0 }, 'days'],
    [{ email: 'a@shop.test', days: 31 }, 'days'],
    [{ email: 'a@shop.test', days: 2.5 }, 'days'],
  ])('refuses %j with a 400 on %s and queues no mail', async (body, field) => {
    const { agent, id } = await newSheet()
    const response = await agent.post(`/api/builds/${id}/share`).send(body)
    expect(response.status).toBe(400)
    expect(JSON.stringify(response.body.error.details)).toContain(field)
    const queued: unknown[] = await t.dataSource.query('SELECT "id" FROM "mail_outbox" WHERE "kind" LIKE \'shared-%\'')
    expect(queued).toEqual([])
  })

  it('lets the owner, an editor and an admin share, but not another tech or a counter', async () => {
    const { id } = await newSheet('tech')
    for (const role of ['editor', 'admin'] as const) {
      expect((await (await t.signIn(role)).post(`/api/builds/${id}/share`).send({ email: 'a@shop.test' })).status).toBe(201)
    }
    expect((await (await t.signIn('counter')).post(`/api/builds/${id}/share`).send({ email: 'a@shop.test' })).status).toBe(403)
    const editorsSheet = await newSheet('editor')
    expect((await (await t.signIn('tech')).post(`/api/builds/${editorsSheet.id}/share`).send({ email: 'a@shop.test' })).status).toBe(404)
  })
})

describe('sharing a quote by mail', { timeout: 30_000 }, () => {
  it('mails a link that opens the quote read-only, its totals and cautions included', async () => {
    const quote = await (await t.signIn('tech')).post('/api/quotes').send({ slots: SLOTS, customer: 'Walk-in, blue hatchback' })
    expect(quote.status).toBe(201)
    const counter = await t.signIn('counter')
    const shared = await counter.post(`/api/quotes/${quote.body.id}/share`).send({ email: 'walk-in@example.test' })
    expect(shared.status, JSON.stringify(shared.body)).toBe(201)
    expect(Math.round((Date.parse(shared.body.expiresAt) - Date.now()) / 86_400_000)).toBe(7)

    const [mail] = await deliveredTo('walk-in@example.test')
    expect(mail!.subject).toContain('Walk-in, blue hatchback')
    const { token } = sharedLink(mail!)
    const visitor = await anonymous(t.app)
    const opened = await visitor.post('/api/shared/open').send({ token })
    expect(opened.status).toBe(200)
    expect(opened.body.kind).toBe('quote')
    expect(opened.body.quote).toMatchObject({ id: quote.body.id, totals: quote.body.totals, lines: quote.body.lines })
    expect(opened.body.quote.cautions.length).toBeGreaterThan(0)
    expect((await visitor.post(`/api/quotes/${quote.body.id}/accept`)).status).toBe(401)
    expect((await visitor.get(`/api/quotes/${quote.body.id}`)).status).toBe(401)
  })

  it('lets a counter, an editor and an admin share a quote, but not a tech; an unknown quote is a 404', async () => {
    const quote = await (await t.signIn('tech')).post('/api/quotes').send({ slots: SLOTS })
    expect((await (await t.signIn('tech')).post(`/api/quotes/${quote.body.id}/share`).send({ email: 'a@shop.test' })).status).toBe(403)
    for (const role of ['editor', 'admin'] as const) {
      expect((await (await t.signIn(role)).post(`/api/quotes/${quote.body.id}/share`).send({ email: 'a@shop.test' })).status).toBe(201)
    }
    expect((await (await t.signIn('counter')).post('/api/quotes/99999/share').send({ email: 'a@shop.test' })).status).toBe(404)
  })
})
