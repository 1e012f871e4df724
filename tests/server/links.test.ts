import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { expectBadRequest } from '../helpers/expect-error'
import { createTestApp, type TestApp } from '../helpers/test-app'
const fitResults = (body: { groups: { results: unknown[] }[] }) => body.groups.flatMap((group) => group.results)

let t: TestApp
let editor: Awaited<ReturnType<TestApp['signIn']>>
beforeAll(async () => {
  t = await createTestApp()
  editor = await t.signIn('editor')
})
afterAll(() => t.close())

const fitsOf = async (part: string) =>
  fitResults((await editor.get(`/api/parts/${part}/fits?inferred=0`)).body) as {
    part: { partNumber: string }
    relation: string
    review: string
  }[]

describe('/api/links (editors review and edit the fitment graph)', () => {
  it('lists proposed links for review', async () => {
    const response = await editor.get('/api/links?status=proposed')
    expect(response.status).toBe(200)
    expect(response.body.total).toBe(2)
    expect(response.body.items[0]).toMatchObject({ status: 'proposed', source: 'field-report' })
  })

  it('approving a proposed link makes it count in verdicts', async () => {
    const slots = { head: 'TM-HD-2050', 'exhaust-manifold': 'TM-EM-2000H' }
    const before = await editor.post('/api/builds/evaluate').send({ slots })
    expect(before.body.pairs[0].decidedBy).toBe('rule')
    const link = (await editor.get('/api/links?status=proposed&part=TM-EM-2000H')).body.items[0]
    const approved = await editor.patch(`/api/links/${link.id}`).send({ status: 'approved' })
    expect(approved.body.status).toBe('approved')
    const after = await editor.post('/api/builds/evaluate').send({ slots })
    expect(after.body.pairs[0].decidedBy).toBe('link')
  })

  it('rejecting a link takes it out of what fits', async () => {
    const link = (await editor.get('/api/links?status=proposed&part=TM-IN-2036')).body.items[0]
    expect((await fitsOf('TM-IN-2036')).map((r) => r.part.partNumber)).toContain('TM-FR-1800')
    await editor.patch(`/api/links/${link.id}`).send({ status: 'rejected' })
    expect((await fitsOf('TM-IN-2036')).map((r) => r.part.partNumber)).not.toContain('TM-FR-1800')
  })

  it('creates an approved editor link, changes it and deletes it', async () => {
    const created = await editor
      .post('/api/links')
      .send({ fromPart: 'TM-IM-2000T', toPart: 'TM-HD-2050', relation: 'fits', note: 'Checked on the bench.' })
    expect(created.status).toBe(201)
    expect(created.body).toMatchObject({ relation: 'fits', status: 'approved', source: 'editor' })
    const changed = await editor
      .patch(`/api/links/${created.body.id}`)
      .send({ relation: 'fits-with-modification', modifications: ['port-match-grind'] })
    expect(changed.body.modifications).toEqual(['port-match-grind'])
    const modification = (await editor.get('/api/modifications')).body.find((m: { name: string }) => m.name === 'port-match-grind')
    expect(modification.status).toBe('proposed') // a new name waits for an editor to describe it
    expect((await fitsOf('TM-HD-2050')).find((r) => r.part.partNumber === 'TM-IM-2000T')!.relation).toBe('fits-with-modification')
    expect((await editor.delete(`/api/links/${created.body.id}`)).status).toBe(204)
    expect((await editor.get(`/api/links?part=TM-IM-2000T`)).body.total).toBe(0)
  })

  it('declares two parts identical, and their links are shared at once', async () => {
    expect((await fitsOf('TM-HD-1810')).map((r) => r.part.partNumber)).not.toContain('TM-DS-2000')
    const identity = await editor
      .post('/api/identities')
      .send({ partA: 'TM-HD-1810', partB: 'TM-HD-1800', note: 'Same casting, later number.' })
    expect(identity.status).toBe(201)
    expect((await fitsOf('TM-HD-1810')).map((r) => r.part.partNumber)).toContain('TM-DS-2000')
    expect((await editor.delete(`/api/identities/${identity.body.id}`)).status).toBe(204)
    expect((await fitsOf('TM-HD-1810')).map((r) => r.part.partNumber)).not.toContain('TM-DS-2000')
  })

  it('refuses bad links with a message and writes nothing', async () => {
    const before = (await editor.get('/api/links')).body.total
    expectBadRequest(await editor.post('/api/links').send({ fromPart: 'TM-HD-2000', toPart: 'TM-HD-2000', relation: 'fits' }), 'toPart')
    expectBadRequest(
      await editor.post('/api/links').send({ fromPart: 'TM-HD-2000', toPart: 'NOPE', relation: 'fits' }),
      'toPart',
      /Unknown part/,
    )
    expectBadRequest(
      await editor.post('/api/links').send({ fromPart: 'TM-HD-2000', toPart: 'TM-IM-2000', relation: 'fits-with-modification' }),
      'modifications',
    )
    expectBadRequest(
      await editor.post('/api/links').send({ fromPart: 'TM-HD-2000', toPart: 'TM-IM-2000', relation: 'sort-of' }),
      'relation',
    )
    const duplicate = await editor.post('/api/links').send({ fromPart: 'TM-BL-2000', toPart: 'TM-HD-2000', relation: 'does-not-fit' })
    expect(duplicate.status).toBe(409)
    expect((await editor.get('/api/links')).body.total).toBe(before)
  })

  it('records a change by hand as a batch that blocks reverting the import it changed, and can itself be reverted', async () => {
    const link = (await editor.get('/api/links?part=TM-HD-1810')).body.items.find((l: { to: string; from: string }) =>
      [l.from, l.to].includes('TM-BL-1800'),
    )
    const importBatch = (await editor.get('/api/imports')).body.find((b: { fileName: string }) => b.fileName === 'demo/links.csv')
    expect(importBatch).toBeDefined()
    await editor.patch(`/api/links/${link.id}`).send({ note: 'Checked again on the bench.' })
    const batches = (await editor.get('/api/imports')).body as { id: number; fileName: string; userName: string }[]
    const hand = batches[0]!
    expect(hand).toMatchObject({ fileName: 'changed by hand', userName: 'Tobias Ferrand' })
    const blocked = await editor.post(`/api/imports/${importBatch.id}/revert`)
    expect(blocked.status).toBe(409)
    expect((await editor.post(`/api/imports/${hand.id}/revert`)).status).toBe(200)
    expect((await editor.get(`/api/links?part=TM-HD-1810`)).body.items[0].note).toBe(link.note)
  })

  it('refuses modifications on a link that is not a fit with modification, even when only the modifications change', async () => {
    const link = (await editor.get('/api/links?part=TM-HD-1810')).body.items[0]
    expect(link.relation).toBe('fits')
    expectBadRequest(await editor.patch(`/api/links/${link.id}`).send({ modifications: ['made-up-mod'] }), 'modifications')
    const names = (await editor.get('/api/modifications')).body.map((m: { name: string }) => m.name)
    expect(names).not.toContain('made-up-mod')
  })

  it('keeps one relation per pair: no identity over a link, no link over an identity', async () => {
    const overLink = await editor.post('/api/identities').send({ partA: 'TM-HD-2000', partB: 'TM-BL-2000' })
    expect(overLink.status).toBe(409)
    const overIdentity = await editor.post('/api/links').send({ fromPart: 'TM-BL-2000', toPart: 'TM-BL-2001', relation: 'fits' })
    expect(overIdentity.status).toBe(409)
    expect(overIdentity.body.error.message).toMatch(/identical/)
  })

  it('is for editors and administrators only', async () => {
    const tech = await t.signIn('tech')
    expect((await tech.get('/api/links')).status).toBe(403)
    expect((await tech.post('/api/links').send({ fromPart: 'TM-HD-2000', toPart: 'TM-IM-2000', relation: 'fits' })).status).toBe(403)
    const admin = await t.signIn('admin')
    expect((await admin.get('/api/links')).status).toBe(200)
  })
})
