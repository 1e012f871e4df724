import { afterEach, beforeEach, describe, expect, it } from 'vitest'
import { catalogueSnapshot, uploadCsv } from '../helpers/imports'
import { createTestApp, type TestApp } from '../helpers/test-app'
const fitResults = (body: { groups: { results: unknown[] }[] }) => body.groups.flatMap((group) => group.results)

let t: TestApp
let editor: Awaited<ReturnType<TestApp['signIn']>>
beforeEach(async () => {
  t = await createTestApp()
  editor = await t.signIn('editor')
})
afterEach(() => t.close())

const LINKS = 'from_part,to_part,relation,modifications,note,source'

async function commit(csv: string, type: 'parts' | 'links') {
  const response = await uploadCsv(editor, csv, { type, mode: 'commit' })
  expect(response.status, JSON.stringify(response.body)).toBe(201)
  return response.body.batchId as number
}

describe('POST /api/imports/:id/revert', () => {
  it('restores every catalogue row exactly as before a parts batch that created and updated parts', async () => {
    const before = await catalogueSnapshot(t.dataSource)
    const batchId = await commit(
      'part_number,kind,name,notes,chamber_cc,casting_marks\nTM-HD-2000,head,TK20V head (renamed),Changed.,43,H20-9999\nTM-HD-2100,head,New head,,42,H20-3190\n',
      'parts',
    )
    expect(await catalogueSnapshot(t.dataSource)).not.toEqual(before)
    const response = await editor.post(`/api/imports/${batchId}/revert`)
    expect(response.status).toBe(200)
    expect(response.body).toMatchObject({
      id: batchId,
      status: 'reverted',
      revertedByName: 'Tobias Ferrand',
      revertedAt: expect.any(String),
    })
    expect(await catalogueSnapshot(t.dataSource)).toEqual(before)
  })

  it('restores a replaced link, removes the identity and the proposed modification a links batch made', async () => {
    const before = await catalogueSnapshot(t.dataSource)
    const batchId = await commit(
      `${LINKS}\nTM-BL-2000,TM-HD-2000,identical,,Test.,\nTM-HD-1810,TM-BL-2000,fits-with-modification,head-stud-sleeve,,\nTM-HD-2000,TM-BL-1800,fits,,Changed.,editor\n`,
      'links',
    )
    expect((await editor.post(`/api/imports/${batchId}/revert`)).status).toBe(200)
    expect(await catalogueSnapshot(t.dataSource)).toEqual(before)
    expect(fitResults((await editor.get('/api/parts/TM-HD-2000/fits?inferred=0')).body)).toContainEqual(
      expect.objectContaining({ part: expect.objectContaining({ partNumber: 'TM-BL-2000' }), relation: 'fits' }),
    )
  })

  it('is refused, naming the later batch, while a later batch changed the same records; allowed once that one is reverted', async () => {
    const before = await catalogueSnapshot(t.dataSource)
    const first = await commit(`${LINKS}\nTM-HD-2000R,TM-BL-2001,fits,,First.,\n`, 'links')
    const second = await commit(`${LINKS}\nTM-HD-2000R,TM-BL-2001,fits,,Second.,\n`, 'links')

    const refused = await editor.post(`/api/imports/${first}/revert`)
    expect(refused.status).toBe(409)
    expect(refused.body.error).toMatchObject({ code: 'revert_blocked', message: expect.stringContaining(`Batch ${second} (links.csv)`) })
    expect(refused.body.error.message).toContain('revert it first')

    expect((await editor.post(`/api/imports/${second}/revert`)).status).toBe(200)
    expect((await editor.post(`/api/imports/${first}/revert`)).status).toBe(200)
    expect(await catalogueSnapshot(t.dataSource)).toEqual(before)
  })

  it('is refused for a parts batch whose new parts a later links batch links', async () => {
    const parts = await commit('part_number,kind,name\nTM-HD-2100,head,New head\n', 'parts')
    const links = await commit(`${LINKS}\nTM-HD-2100,TM-BL-2000,fits,,,\n`, 'links')
    const refused = await editor.post(`/api/imports/${parts}/revert`)
    expect(refused.status).toBe(409)
    expect(refused.body.error.details).toEqual([
      { path: `batch ${links}`, message: expect.stringContaining('links parts this batch added') },
    ])
    expect((await editor.get('/api/parts/TM-HD-2100')).status).toBe(200)
  })

  it('is refused for a demo parts batch whose parts links outside imports use', async () => {
    const batches = (await editor.get('/api/imports')).body as { id: number; fileName: string }[]
    const exhaust = batches.find((batch) => batch.fileName === 'demo/parts/manifolds.csv')!
    const links = batches.find((batch) => batch.fileName === 'demo/links.csv')!
    expect((await editor.post(`/api/imports/${links.id}/revert`)).status).toBe(200)
    const refused = await editor.post(`/api/imports/${exhaust.id}/revert`)
    expect(refused.status).toBe(409)
    expect(refused.body.error.details).toContainEqual({
      path: 'outside imports',
      message: expect.stringContaining('links parts this batch added'),
    })
  })

  it('answers 409 for a batch already reverted and 404 for an unknown one', async () => {
    const batchId = await commit('part_number,kind,name\nTM-X-1,other,Washer\n', 'parts')
    expect((await editor.post(`/api/imports/${batchId}/revert`)).status).toBe(200)
    const again = await editor.post(`/api/imports/${batchId}/revert`)
    expect(again.status).toBe(409)
    expect(again.body.error.code).toBe('already_reverted')
    expect((await editor.post('/api/imports/99999/revert')).status).toBe(404)
  })
})

describe('GET /api/imports', () => {
  it('lists batches newest first with who, when, file name, hash and counts', async () => {
    const batchId = await commit('part_number,kind,name\nTM-X-1,other,Washer\n', 'parts')
    const response = await editor.get('/api/imports')
    expect(response.status).toBe(200)
    expect(response.body[0]).toEqual({
      id: batchId,
      type: 'parts',
      fileName: 'parts.csv',
      fileHash: expect.stringMatching(/^[0-9a-f]{64}$/),
      userName: 'Tobias Ferrand',
      createdAt: expect.any(String),
      counts: { created: 1, updated: 0, unchanged: 0, rejected: 0 },
      validRowsOnly: false,
      status: 'committed',
      revertedAt: null,
      revertedByName: null,
    })
    expect(response.body.map((batch: { fileName: string }) => batch.fileName)).toContain('demo/links.csv')
    expect(response.body[0].id).toBeGreaterThan(response.body[1].id)
  })
})

describe('imports and reverts reach the fit graph by the rows they touched', () => {
  it('shows a committed links batch in what fits and path, and takes it back on revert, without loading the graph again', async () => {
    const parts = await commit('part_number,kind,name\nTM-X-71,other,Spacer ring\nTM-X-72,other,Dowel sleeve\n', 'parts')
    const loads = t.services.graphIndex.loads
    const links = await commit(
      `${LINKS}\nTM-X-71,TM-HD-2000,fits,,Ring seats in the head's dowel bore.,\nTM-X-72,TM-X-71,fits,,,\nTM-X-72,TM-BL-2000,does-not-fit,,Sleeve too long for the block.,\n`,
      'links',
    )
    const fits = async (part: string) =>
      fitResults((await editor.get(`/api/parts/${part}/fits?inferred=0&pageSize=200`)).body) as {
        part: { partNumber: string }
        relation: string
      }[]
    expect((await fits('TM-HD-2000')).map((r) => r.part.partNumber)).toContain('TM-X-71')
    // TM-BL-2001 is the same block as TM-BL-2000 in the demo, so it answers too.
    expect((await fits('TM-X-72')).map((r) => [r.part.partNumber, r.relation]).sort()).toEqual([
      ['TM-BL-2000', 'does-not-fit'],
      ['TM-BL-2001', 'does-not-fit'],
      ['TM-X-71', 'fits'],
    ])
    expect((await editor.get('/api/graph/path?from=TM-X-72&to=TM-HD-2000')).body.found).toBe(true)

    expect((await editor.post(`/api/imports/${links}/revert`)).status).toBe(200)
    expect((await fits('TM-HD-2000')).map((r) => r.part.partNumber)).not.toContain('TM-X-71')
    expect(await fits('TM-X-72')).toEqual([])
    expect((await editor.get('/api/graph/path?from=TM-X-72&to=TM-HD-2000')).body.found).toBe(false)

    expect((await editor.post(`/api/imports/${parts}/revert`)).status).toBe(200)
    expect((await editor.get('/api/parts/TM-X-71/fits')).status).toBe(404)
    expect(t.services.graphIndex.loads).toBe(loads)
  })
})
