import { afterEach, beforeEach, describe, expect, it } from 'vitest'
import { createTestApp, type TestApp } from '../helpers/test-app'

let t: TestApp
let tech: Awaited<ReturnType<TestApp['signIn']>>
let editor: Awaited<ReturnType<TestApp['signIn']>>
beforeEach(async () => {
  t = await createTestApp()
  tech = await t.signIn('tech')
  editor = await t.signIn('editor')
})
afterEach(() => t.close())

type Pair = { from: string; to: string; relation: string; modifications?: string[]; note?: string }
type Fit = { part: { partNumber: string }; relation: string; review: string; fieldReports: { confirmed: number; contradicted: number } }

async function fileReport(pairs: Pair[]): Promise<number> {
  const response = await tech.post('/api/field-reports').field('report', JSON.stringify({ pairs }))
  expect(response.status, JSON.stringify(response.body)).toBe(201)
  return response.body.id as number
}

async function fitOf(part: string, other: string): Promise<Fit | undefined> {
  const body = (await editor.get(`/api/parts/${part}/fits?inferred=0&pageSize=200`)).body as { groups: { results: Fit[] }[] }
  return body.groups.flatMap((group) => group.results).find((fit) => fit.part.partNumber === other)
}

// A new pair, a pair the catalogue already has the same way, and one it has the other way.
const NEW: Pair = {
  from: 'TM-HD-1810',
  to: 'TM-BL-2000',
  relation: 'fits-with-modification',
  modifications: ['bolt-spacer-shim'],
  note: 'Shim under bolt 3.',
}
const SAME: Pair = { from: 'TM-HD-2000', to: 'TM-BL-1800', relation: 'fits-with-modification', modifications: ['oil-restrictor-fit'] }
const OTHERWISE: Pair = { from: 'TM-HD-1800', to: 'TM-BL-1800', relation: 'does-not-fit', note: 'Deck warped on this casting run.' }

describe('approving a field report', () => {
  it('writes new pairs as approved links from the field, confirms matching links, flags contradicted ones unchanged, as one revertible batch', async () => {
    const id = await fileReport([NEW, SAME, OTHERWISE])
    const approved = await editor.post(`/api/field-reports/${id}/approve`).send({ note: 'Photos show the shim.' })
    expect(approved.status, JSON.stringify(approved.body)).toBe(200)
    expect(approved.body.report).toMatchObject({ status: 'approved', decision: { note: 'Photos show the shim.' } })
    expect(approved.body.links.created).toHaveLength(1)
    expect(approved.body.links.confirmed).toHaveLength(1)
    expect(approved.body.links.contradicted).toHaveLength(1)

    expect(await fitOf('TM-HD-1810', 'TM-BL-2000')).toMatchObject({
      relation: 'fits-with-modification',
      review: 'approved',
      fieldReports: { confirmed: 1, contradicted: 0 },
    })
    expect(await fitOf('TM-HD-2000', 'TM-BL-1800')).toMatchObject({ fieldReports: { confirmed: 1, contradicted: 0 } })
    // Contradicted, never silently changed: the link still says fits.
    expect(await fitOf('TM-HD-1800', 'TM-BL-1800')).toMatchObject({ relation: 'fits', fieldReports: { confirmed: 0, contradicted: 1 } })
    // The contradicted link waits in the editor's review list, still approved and unchanged.
    const contradicted = (await editor.get('/api/links?contradicted=1')).body.items as {
      from: string
      to: string
      status: string
      contradictedBy: number
    }[]
    expect(contradicted).toEqual([expect.objectContaining({ status: 'approved', contradictedBy: 1 })])
    expect([contradicted[0]!.from, contradicted[0]!.to].sort()).toEqual(['TM-BL-1800', 'TM-HD-1800'])
    expect((await editor.get('/api/links?contradicted=2')).status).toBe(400)
    // Reached through an identical number, the line names the link its reports are on, and they are found there.
    const throughIdentical = await fitOf('TM-HD-1810', 'TM-BL-2001')
    expect(throughIdentical).toMatchObject({ fieldReports: { confirmed: 1 } })
    const [linkFrom, linkTo] = (throughIdentical as Fit & { linkParts: [string, string] }).linkParts
    expect([linkFrom, linkTo].sort()).toEqual(['TM-BL-2000', 'TM-HD-1810'])
    const reports = (await editor.get(`/api/field-reports?from=${linkFrom}&to=${linkTo}`)).body.items as { id: number }[]
    expect(reports.map((report) => report.id)).toContain(id)
    // A build with the confirmed pair says so on the pair, and a rule-decided pair carries no report.
    const build = (
      await editor.post('/api/builds/evaluate').send({ slots: { head: 'TM-HD-1810', block: 'TM-BL-2000', 'head-gasket': 'TM-HG-2000' } })
    ).body as { pairs: { slots: string[]; decidedBy: string; fieldReports: { confirmed: number; contradicted: number } }[] }
    const headOnBlock = build.pairs.find((pair) => pair.slots.includes('head') && pair.slots.includes('block'))
    expect(headOnBlock).toMatchObject({ decidedBy: 'link', fieldReports: { confirmed: 1, contradicted: 0 } })
    const byRule = build.pairs.find((pair) => pair.decidedBy === 'rule')
    expect(byRule?.fieldReports).toEqual({ confirmed: 0, contradicted: 0 })

    const links = (await editor.get('/api/links?part=TM-HD-1810')).body.items as { id: number }[]
    const link = links.find((item) => item.id === approved.body.links.created[0])
    expect(link).toMatchObject({
      source: 'field-report',
      status: 'approved',
      note: 'Shim under bolt 3.',
      modifications: ['bolt-spacer-shim'],
    })
    const proposed = (await editor.get('/api/modifications')).body as { name: string; status?: string }[]
    expect(proposed.find((m) => m.name === 'bolt-spacer-shim')).toBeDefined()

    // The reports behind a line, either way round; only those counted on that link.
    const behind = (await editor.get('/api/field-reports?from=TM-BL-2000&to=TM-HD-1810')).body
    expect(behind.items.map((r: { id: number }) => r.id)).toEqual([id])
    expect((await editor.get('/api/field-reports?from=TM-HD-2000&to=TM-BL-2000')).body.total).toBe(0)
    expect((await editor.get('/api/field-reports?from=TM-HD-2000')).status).toBe(400)

    const batches = (await editor.get('/api/imports')).body as { id: number; fileName: string }[]
    expect(batches[0]).toMatchObject({ id: approved.body.batchId, fileName: `field report #${id}` })

    const reverted = await editor.post(`/api/imports/${approved.body.batchId}/revert`)
    expect(reverted.status, JSON.stringify(reverted.body)).toBe(200)
    expect(await fitOf('TM-HD-1810', 'TM-BL-2000')).toBeUndefined()
    expect(await fitOf('TM-HD-2000', 'TM-BL-1800')).toMatchObject({ fieldReports: { confirmed: 0, contradicted: 0 } })
    expect((await editor.get(`/api/field-reports/${id}`)).body).toMatchObject({ status: 'submitted', decision: null })
  })

  it('refuses to revert an approval while a later approval counts a report on a link it wrote', async () => {
    const first = await fileReport([NEW])
    const second = await fileReport([NEW])
    const one = (await editor.post(`/api/field-reports/${first}/approve`).send({})).body
    const two = (await editor.post(`/api/field-reports/${second}/approve`).send({})).body
    expect(two.links.confirmed).toEqual(one.links.created)
    expect(await fitOf('TM-HD-1810', 'TM-BL-2000')).toMatchObject({ fieldReports: { confirmed: 2 } })
    const blocked = await editor.post(`/api/imports/${one.batchId}/revert`)
    expect(blocked.status).toBe(409)
    expect(blocked.body.error.message).toContain(`field report #${second}`)
    expect((await editor.post(`/api/imports/${two.batchId}/revert`)).status).toBe(200)
    expect((await editor.post(`/api/imports/${one.batchId}/revert`)).status).toBe(200)
  })
})

describe('rejecting and asking for more', () => {
  it('needs a reason to reject, sends a question back, and refuses a second decision', async () => {
    const id = await fileReport([SAME])
    const noReason = await editor.post(`/api/field-reports/${id}/reject`).send({ reason: '  ' })
    expect(noReason.status).toBe(400)
    expect(noReason.body.error.details[0]).toMatchObject({ path: 'reason', message: 'Say why the report is rejected.' })
    const asked = await editor.post(`/api/field-reports/${id}/ask`).send({ question: 'Which bolt had the washers?' })
    expect(asked.body).toMatchObject({ status: 'needs-more', decision: { note: 'Which bolt had the washers?' } })
    expect((await tech.get(`/api/field-reports/${id}`)).body.status).toBe('needs-more')
    const rejected = await editor.post(`/api/field-reports/${id}/reject`).send({ reason: 'No photos of the boss.' })
    expect(rejected.body).toMatchObject({ status: 'rejected', decision: { note: 'No photos of the boss.' } })
    const again = await editor.post(`/api/field-reports/${id}/approve`).send({})
    expect(again.status).toBe(409)
    expect(await fitOf('TM-HD-2000', 'TM-BL-1800')).toMatchObject({ fieldReports: { confirmed: 0 } })
  })

  it('lets only editors and admins decide', async () => {
    const id = await fileReport([SAME])
    expect((await tech.post(`/api/field-reports/${id}/approve`).send({})).status).toBe(403)
    expect((await editor.post('/api/field-reports/999/approve').send({})).status).toBe(404)
    expect((await editor.post(`/api/field-reports/${id}/approve`).send({ extra: 1 })).status).toBe(400)
  })
})
