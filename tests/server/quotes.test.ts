import request from 'supertest'
import { afterEach, beforeEach, describe, expect, it } from 'vitest'
import { createTestApp, type TestApp } from '../helpers/test-app'

let t: TestApp
let tech: Awaited<ReturnType<TestApp['signIn']>>
beforeEach(async () => {
  t = await createTestApp()
  tech = await t.signIn('tech')
})
afterEach(() => t.close())

type Line = {
  kind: string
  partNumber?: string
  quantity: number
  unitPriceCents: number
  stockItemId?: number
  site?: string
  location?: string
  toOrder: boolean
  minutes?: number
}
const SLOTS = { block: 'TM-BL-1800', head: 'TM-HD-2000' }

describe('quotes for the whole job', () => {
  it('prices each part from the unit to take, adds the core charge, labour at the shop rate and tax', async () => {
    const response = await tech.post('/api/quotes').send({ slots: SLOTS, customer: 'Walk-in, blue hatchback' })
    expect(response.status, JSON.stringify(response.body)).toBe(201)
    const quote = response.body as {
      lines: Line[]
      totals: { partsCents: number; labourCents: number; coreCents: number; taxCents: number; totalCents: number }
      shop: { labourRateCents: number; taxRateBasisPoints: number }
      status: string
    }
    expect(quote.status).toBe('draft')
    // The new TK20V head from the Northgate counter beats nothing else on a shelf.
    const head = quote.lines.find((line) => line.partNumber === 'TM-HD-2000' && line.kind === 'part')
    expect(head).toMatchObject({ unitPriceCents: 48900, site: 'Northgate counter', location: 'Aisle 3, shelf 2', toOrder: false })
    const block = quote.lines.find((line) => line.partNumber === 'TM-BL-1800' && line.kind === 'part')
    expect(block).toMatchObject({ unitPriceCents: 9000, site: 'Hollin yard, lot B' })
    // Two assembly groups (bottom end, top end) at the default 45 minutes each.
    const base = quote.lines.find((line) => line.kind === 'labour' && line.minutes === 90)
    expect(base?.unitPriceCents).toBe(quote.shop.labourRateCents)
    const sum = (kind: string) =>
      quote.lines
        .filter((l) => l.kind === kind || (kind === 'part' && l.kind === 'consumable'))
        .reduce(
          (total, l) =>
            total +
            (l.minutes !== undefined ? Math.floor((l.minutes * l.unitPriceCents + 30) / 60) : Math.round(l.quantity * l.unitPriceCents)),
          0,
        )
    expect(quote.totals.partsCents).toBe(sum('part'))
    expect(quote.totals.labourCents).toBe(sum('labour'))
    const taxable = quote.totals.partsCents + quote.totals.labourCents + quote.totals.coreCents
    expect(quote.totals.taxCents).toBe(Math.floor((taxable * quote.shop.taxRateBasisPoints + 5000) / 10000))
    expect(quote.totals.totalCents).toBe(taxable + quote.totals.taxCents)
    expect((await tech.get(`/api/quotes/${(response.body as { id: number }).id}`)).body.lines).toEqual(quote.lines)
  })

  it('quotes a saved build sheet and refuses bad input', async () => {
    const sheets = (await tech.get('/api/builds')).body as { id: number; name: string }[]
    const sheet = sheets.find((s) => s.name === 'TK20V head on a TK18 block')!
    const fromSheet = await tech.post('/api/quotes').send({ buildSheetId: sheet.id })
    expect(fromSheet.status).toBe(201)
    expect(fromSheet.body.buildSheetId).toBe(sheet.id)
    expect((await tech.post('/api/quotes').send({ buildSheetId: 99999 })).status).toBe(404)
    expect((await tech.post('/api/quotes').send({ slots: { block: 'TM-NOPE' } })).status).toBe(400)
    expect((await tech.post('/api/quotes/12345/accept')).status).toBe(404)
  })

  it('lists quotes newest first with the build, the customer and the total in the shop currency', async () => {
    const sheets = (await tech.get('/api/builds')).body as { id: number; name: string }[]
    const sheet = sheets.find((s) => s.name === 'TK20V head on a TK18 block')!
    const older = (await tech.post('/api/quotes').send({ slots: SLOTS, customer: 'Walk-in' })).body as { id: number }
    const newer = (await tech.post('/api/quotes').send({ buildSheetId: sheet.id, customer: 'R. Okafor' })).body as {
      id: number
      buildName: string | null
      totals: { totalCents: number }
    }
    expect(newer.buildName).toBe('TK20V head on a TK18 block')
    const counter = await t.signIn('counter')
    const list = await counter.get('/api/quotes')
    expect(list.status).toBe(200)
    const mine = (list.body as { items: { id: number }[] }).items.filter((q) => q.id === older.id || q.id === newer.id)
    expect(mine).toEqual([
      expect.objectContaining({
        id: newer.id,
        customer: 'R. Okafor',
        buildName: 'TK20V head on a TK18 block',
        totalCents: newer.totals.totalCents,
        currency: 'EUR',
        status: 'draft',
      }),
      expect.objectContaining({ id: older.id, customer: 'Walk-in', buildName: null }),
    ])
    expect((await request(t.app).get('/api/quotes')).status).toBe(401)
  })

  it('lets only one of two counters racing for the last unit reserve it', async () => {
    const counterA = await t.signIn('counter')
    const counterB = await t.signIn('editor')
    const first = (await counterA.post('/api/quotes').send({ slots: { head: 'TM-HD-2000' } })).body as { id: number; lines: Line[] }
    const second = (await counterB.post('/api/quotes').send({ slots: { head: 'TM-HD-2000' } })).body as { id: number; lines: Line[] }
    const unit = first.lines.find((line) => line.stockItemId)!.stockItemId
    expect(second.lines.find((line) => line.stockItemId)?.stockItemId).toBe(unit)
    const answers = await Promise.all([counterA.post(`/api/quotes/${first.id}/accept`), counterB.post(`/api/quotes/${second.id}/accept`)])
    expect(answers.map((a) => a.status).sort()).toEqual([200, 409])
    const loser = answers.find((a) => a.status === 409)!
    expect(loser.body.error.message).toContain('gone since the quote was made')
    expect((await counterA.get(`/api/stock/${unit}`)).body.status).toBe('reserved')
    const headsInStock = (await counterA.get('/api/parts/TM-BL-1800/fits?kind=head&inStock=1')).body.groups.flatMap(
      (g: { results: { part: { partNumber: string } }[] }) => g.results.map((r) => r.part.partNumber),
    )
    expect(headsInStock).not.toContain('TM-HD-2000')
    // The reservation runs out: the unit goes back on the shelf.
    expect(await t.services.stock.releaseExpired(new Date(Date.now() + 100 * 3_600_000))).toBe(1)
    expect((await counterA.get(`/api/stock/${unit}`)).body.status).toBe('available')
  })

  it('keeps shop settings for admins to change', async () => {
    const admin = await t.signIn('admin')
    const shop = {
      name: 'Harl Street Engines',
      address: '3 Harl Street',
      labourRateCents: 9000,
      taxRateBasisPoints: 825,
      currency: 'EUR',
      baseMinutesPerGroup: 30,
      reservationHours: 24,
    }
    expect((await admin.put('/api/settings/shop').send(shop)).status).toBe(200)
    expect((await tech.put('/api/settings/shop').send(shop)).status).toBe(403)
    expect((await admin.put('/api/settings/shop').send({ ...shop, taxRateBasisPoints: -1 })).status).toBe(400)
    const quote = (await tech.post('/api/quotes').send({ slots: SLOTS })).body
    expect(quote.shop).toMatchObject({ name: 'Harl Street Engines', taxRateBasisPoints: 825 })
    expect(quote.lines.find((l: Line) => l.kind === 'labour' && l.minutes === 60)).toBeDefined()
  })

  it('replaces the shop settings when an admin saves them again', async () => {
    const admin = await t.signIn('admin')
    const first = (await admin.get('/api/settings/shop')).body
    expect((await admin.put('/api/settings/shop').send({ ...first, name: 'First Lot Engines' })).status).toBe(200)
    expect((await admin.put('/api/settings/shop').send({ ...first, name: 'Second Lot Engines' })).status).toBe(200)
    expect((await admin.get('/api/settings/shop')).body).toMatchObject({
      name: 'Second Lot Engines',
      labourRateCents: first.labourRateCents,
    })
  })
})
