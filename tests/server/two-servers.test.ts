import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { postgresServerUrl } from '../helpers/postgres'
import { createTestApp, type TestApp } from '../helpers/test-app'
import { receivedMail } from '../helpers/mailbox'
import { OutboxRepository } from '../../server/mail/outbox.repository'

type Agent = Awaited<ReturnType<TestApp['signIn']>>
type FitsBody = { groups: { results: { part: { partNumber: string }; relation: string; stock: { sites: string[] } }[] }[] }

/** Asks until `answer` passes `expectation` or `ms` have gone by; answers how long it took. */
async function within<T>(ms: number, answer: () => Promise<T>, expectation: (value: T) => void): Promise<number> {
  const started = Date.now()
  for (;;) {
    try {
      expectation(await answer())
      return Date.now() - started
    } catch (error) {
      if (Date.now() - started > ms) throw error
      await new Promise((resolve) => setTimeout(resolve, 25))
    }
  }
}

const fitsOf = async (agent: Agent, part: string, query = 'inferred=0') => {
  const body = (await agent.get(`/api/parts/${part}/fits?${query}`)).body as FitsBody
  return body.groups.flatMap((group) => group.results)
}

describe.skipIf(!postgresServerUrl)('two servers on one PostgreSQL database', () => {
  let first: TestApp
  let second: TestApp
  let editorOnFirst: Agent
  let counterOnFirst: Agent
  let counterOnSecond: Agent

  beforeAll(async () => {
    first = await createTestApp({ postgres: true })
    second = await createTestApp({ sameDatabaseAs: first })
    editorOnFirst = await first.signIn('editor')
    counterOnFirst = await first.signIn('counter')
    counterOnSecond = await second.signIn('counter')
  })
  afterAll(async () => {
    await second?.close()
    await first?.close()
  })

  it('shows a link added, changed and removed on one server in the other one’s what-fits within a second', async () => {
    const numbers = async () => (await fitsOf(counterOnSecond, 'TM-HD-2050')).map((fit) => fit.part.partNumber)
    expect(await numbers()).not.toContain('TM-IM-2000T')

    const created = await editorOnFirst.post('/api/links').send({ fromPart: 'TM-IM-2000T', toPart: 'TM-HD-2050', relation: 'fits' })
    expect(created.status).toBe(201)
    await within(1000, numbers, (list) => expect(list).toContain('TM-IM-2000T'))

    await editorOnFirst
      .patch(`/api/links/${created.body.id}`)
      .send({ relation: 'fits-with-modification', modifications: ['port-match-grind'] })
    const relation = async () => (await fitsOf(counterOnSecond, 'TM-HD-2050')).find((fit) => fit.part.partNumber === 'TM-IM-2000T')
    await within(1000, relation, (fit) => expect(fit?.relation).toBe('fits-with-modification'))

    expect((await editorOnFirst.delete(`/api/links/${created.body.id}`)).status).toBe(204)
    await within(1000, numbers, (list) => expect(list).not.toContain('TM-IM-2000T'))
  })

  it('shows a unit moved to another site on one server in the other one’s stock answer within a second', async () => {
    const { id } = (await counterOnFirst.get('/api/stock/label/HY-B-0441')).body as { id: number }
    const head = async () =>
      (await fitsOf(counterOnSecond, 'TM-BL-1800', 'pageSize=200&kind=head')).find((fit) => fit.part.partNumber === 'TM-HD-1800')
    expect((await head())?.stock.sites).not.toEqual(['Northgate counter'])

    const moved = await counterOnFirst.patch(`/api/stock/${id}`).send({ site: 'Northgate counter', location: 'Aisle 1, shelf 4' })
    expect(moved.status).toBe(200)
    await within(1000, head, (fit) => expect(fit?.stock.sites).toEqual(['Northgate counter']))
  })

  it('names a site added on one server, and the unit shelved there, in the other one’s stock answer', async () => {
    expect((await editorOnFirst.post('/api/sites').send({ name: 'Eastbrook annex' })).status).toBe(201)
    const created = await counterOnFirst.post('/api/stock').send({
      partNumber: 'TM-HD-1800',
      site: 'Eastbrook annex',
      condition: 'used',
      grade: 'A',
      priceCents: 9000,
    })
    expect(created.status, JSON.stringify(created.body)).toBe(201)
    const head = async () =>
      (await fitsOf(counterOnSecond, 'TM-BL-1800', 'pageSize=200&kind=head')).find((fit) => fit.part.partNumber === 'TM-HD-1800')
    await within(1000, head, (fit) => expect(fit?.stock.sites).toContain('Eastbrook annex'))
  })

  it('sends a queued message once, though both servers deliver the outbox at the same moment', async () => {
    const admin = await first.signIn('admin')
    expect((await admin.post('/api/users/invite').send({ email: 'once@shop.test', name: 'Once', role: 'tech' })).status).toBe(201)
    await Promise.all([first.services.outbox.deliverDue(), second.services.outbox.deliverDue()])
    const delivered = [...receivedMail(first.config.mailDir), ...receivedMail(second.config.mailDir)].filter((mail) =>
      mail.to.includes('once@shop.test'),
    )
    expect(delivered).toHaveLength(1)
  })

  it('lets only the server that took a due message send it, until its hold runs out', async () => {
    const admin = await first.signIn('admin')
    expect((await admin.post('/api/users/invite').send({ email: 'held@shop.test', name: 'Held', role: 'tech' })).status).toBe(201)
    const now = new Date(Date.now() + 1000)
    const heldUntil = new Date(now.getTime() + 60_000)
    const recipients = (rows: { recipient: string }[]) => rows.map((row) => row.recipient)
    expect(recipients(await new OutboxRepository(first.db).claimDue(now, 20, heldUntil))).toContain('held@shop.test')
    expect(recipients(await new OutboxRepository(second.db).claimDue(now, 20, heldUntil))).not.toContain('held@shop.test')
    const afterHold = new Date(heldUntil.getTime() + 1)
    expect(recipients(await new OutboxRepository(second.db).claimDue(afterHold, 20, afterHold))).toContain('held@shop.test')
  })

  it('queues one digest of waiting reports for each editor, though both servers run the digest at the same moment', async () => {
    const tech = await first.signIn('tech')
    const pair = { from: 'TM-HD-2000', to: 'TM-BL-1800', relation: 'fits' }
    expect((await tech.post('/api/field-reports').field('report', JSON.stringify({ pairs: [pair] }))).status).toBe(201)
    const [fromFirst, fromSecond] = await Promise.all([
      first.services.fieldReportNotices.digest(),
      second.services.fieldReportNotices.digest(),
    ])
    expect(fromFirst + fromSecond).toBeGreaterThan(0)
    expect(fromFirst === 0 || fromSecond === 0).toBe(true)
  })
})
