import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { expectBadRequest } from '../helpers/expect-error'
import { createTestApp, type TestApp } from '../helpers/test-app'

let t: TestApp
beforeAll(async () => {
  t = await createTestApp()
})
afterAll(() => t.close())

const sheet = { name: 'Customer 4411: head swap', slots: { block: 'TM-BL-1800', head: 'TM-HD-2000' }, targetPowerKw: 105, fuelOctane: 91 }

describe('/api/builds (build sheets)', () => {
  it('lets a tech save, list, reopen, rename and delete a build sheet', async () => {
    const tech = await t.signIn('tech')
    const created = await tech.post('/api/builds').send(sheet)
    expect(created.status).toBe(201)
    expect(created.body).toMatchObject({ name: sheet.name, slots: sheet.slots, targetPowerKw: 105, owner: { name: 'Dario Lenk' } })
    const list = await tech.get('/api/builds')
    expect(list.body.map((s: { id: number }) => s.id)).toContain(created.body.id)
    const renamed = await tech.put(`/api/builds/${created.body.id}`).send({ name: 'Renamed', targetPowerKw: null })
    expect(renamed.body).toMatchObject({ name: 'Renamed', targetPowerKw: null, fuelOctane: 91, slots: sheet.slots })
    expect((await tech.get(`/api/builds/${created.body.id}`)).body.name).toBe('Renamed')
    expect((await tech.delete(`/api/builds/${created.body.id}`)).status).toBe(204)
    expect((await tech.get(`/api/builds/${created.body.id}`)).status).toBe(404)
  })

  it('saves checklist ticks and notes with the sheet and answers them on reopening', async () => {
    const tech = await t.signIn('tech')
    const created = await tech.post('/api/builds').send(sheet)
    expect(created.body.checklist).toEqual({})
    const ticks = { 'oil-restrictor-fit': [2, 0, 2], 'head-stud-sleeve': [] }
    const saved = await tech.put(`/api/builds/${created.body.id}`).send({ checklist: ticks, notes: 'Bosses sleeved.' })
    expect(saved.status).toBe(200)
    const reopened = (await tech.get(`/api/builds/${created.body.id}`)).body
    expect(reopened.checklist).toEqual({ 'oil-restrictor-fit': [0, 2] })
    expect(reopened.notes).toBe('Bosses sleeved.')
  })

  it('answers in the list the verdict and the labour of each sheet as of its last save', async () => {
    const tech = await t.signIn('tech')
    const evaluated = (await tech.post('/api/builds/evaluate').send({ slots: sheet.slots, targetPowerKw: 105, fuelOctane: 91 })).body
    const created = (await tech.post('/api/builds').send(sheet)).body
    const listed = (await tech.get('/api/builds')).body.find((s: { id: number }) => s.id === created.id)
    const minutes = evaluated.modifications.reduce((sum: number, m: { timeMinutes: number | null }) => sum + (m.timeMinutes ?? 0), 0)
    expect(evaluated.modifications.length).toBeGreaterThan(0)
    expect(listed).toMatchObject({ verdict: evaluated.verdict, labourMinutes: minutes })
    expect(minutes).toBeGreaterThan(0)
    const emptied = (await tech.put(`/api/builds/${created.id}`).send({ slots: { block: 'TM-BL-1800' } })).body
    expect(emptied).toMatchObject({ verdict: 'unknown', labourMinutes: 0 })
  })

  it('refuses checklist ticks that are not step indexes', async () => {
    const tech = await t.signIn('tech')
    const created = await tech.post('/api/builds').send(sheet)
    const refused = await tech.put(`/api/builds/${created.body.id}`).send({ checklist: { 'oil-restrictor-fit': [-1] } })
    expectBadRequest(refused, 'checklist.oil-restrictor-fit.0')
  })

  it('stores slots by part number even when a mark was typed', async () => {
    const tech = await t.signIn('tech')
    const created = await tech.post('/api/builds').send({ ...sheet, slots: { head: 'H20-3180' } })
    expect(created.body.slots).toEqual({ head: 'TM-HD-2000' })
  })

  it('keeps sheets to their owner; editors and administrators see all', async () => {
    const tech = await t.signIn('tech')
    const own = (await tech.post('/api/builds').send(sheet)).body
    const editor = await t.signIn('editor')
    const editorSheet = (await editor.post('/api/builds').send({ ...sheet, name: 'Editor sheet' })).body
    expect((await tech.get(`/api/builds/${editorSheet.id}`)).status).toBe(404)
    expect((await tech.get('/api/builds')).body.map((s: { id: number }) => s.id)).not.toContain(editorSheet.id)
    expect((await editor.get(`/api/builds/${own.id}`)).status).toBe(200)
    const admin = await t.signIn('admin')
    expect((await admin.get('/api/builds')).body.map((s: { id: number }) => s.id)).toEqual(expect.arrayContaining([own.id, editorSheet.id]))
  })

  it('ships the demo build sheets for the demo technician', async () => {
    const tech = await t.signIn('tech')
    const names = (await tech.get('/api/builds')).body.map((s: { name: string }) => s.name)
    expect(names).toContain('TK20V head on a TK18 block')
  })

  it('lists the demo sheets judged as saved: each with the verdict and labour its evaluation gives', async () => {
    const tech = await t.signIn('tech')
    const listed = (await tech.get('/api/builds')).body as { id: number; verdict: string | null; labourMinutes: number | null }[]
    expect(listed.length).toBeGreaterThan(1)
    for (const sheet of listed) {
      const opened = (await tech.get(`/api/builds/${sheet.id}`)).body
      const evaluated = (await tech.post('/api/builds/evaluate').send({ slots: opened.slots, ...context(opened) })).body
      const minutes = evaluated.modifications.reduce((sum: number, m: { timeMinutes: number | null }) => sum + (m.timeMinutes ?? 0), 0)
      expect(sheet).toMatchObject({ verdict: evaluated.verdict, labourMinutes: minutes })
    }
    expect(new Set(listed.map((sheet) => sheet.verdict)).size).toBeGreaterThan(1)
  })

  it('answers 403 to a counter, who may evaluate but not save', async () => {
    const counter = await t.signIn('counter')
    expect((await counter.get('/api/builds')).status).toBe(403)
    expect((await counter.post('/api/builds/evaluate').send({ slots: sheet.slots })).status).toBe(200)
  })

  it('answers 400 for a nameless sheet, a wrong-kind slot and an empty update, writing nothing', async () => {
    const tech = await t.signIn('tech')
    const before = (await tech.get('/api/builds')).body.length
    expect((await tech.post('/api/builds').send({ ...sheet, name: ' ' })).status).toBe(400)
    const wrongKind = await tech.post('/api/builds').send({ ...sheet, slots: { head: 'TM-BL-2000' } })
    expectBadRequest(wrongKind, 'slots.head')
    const id = (await tech.get('/api/builds')).body[0].id
    expect((await tech.put(`/api/builds/${id}`).send({})).status).toBe(400)
    expect((await tech.get('/api/builds/not-a-number')).status).toBe(400)
    expect((await tech.get('/api/builds')).body.length).toBe(before)
  })
})

/** The build context a saved sheet carries, as the planner sends it. */
type SheetContext = {
  targetPowerKw: number | null
  fuelOctane: number | null
  chassisModelYear: number | null
  vin: string | null
  faceFinish: Record<string, number> | null
}
function context(sheet: SheetContext) {
  return {
    ...Object.fromEntries(
      Object.entries({
        targetPowerKw: sheet.targetPowerKw,
        fuelOctane: sheet.fuelOctane,
        chassisModelYear: sheet.chassisModelYear,
        vin: sheet.vin,
      }).filter(([, value]) => value !== null),
    ),
    ...sheet.faceFinish,
  }
}
