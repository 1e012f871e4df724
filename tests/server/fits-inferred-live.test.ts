import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { uploadCsv } from '../helpers/imports'
import { createTestApp, type TestApp } from '../helpers/test-app'

let t: TestApp
let editor: Awaited<ReturnType<TestApp['signIn']>>
beforeAll(async () => {
  t = await createTestApp()
  editor = await t.signIn('editor')
})
afterAll(() => t.close())

type Group = { kind: string; relation: string; source: string; total: number; results: { part: { partNumber: string } }[] }

/** The inferred head gaskets of the TK20V block (86 mm bores), by relation, in the order answered. */
async function inferredGaskets(): Promise<Record<string, string[]>> {
  const response = await editor.get('/api/parts/TM-BL-2000/fits?kind=head-gasket')
  expect(response.status).toBe(200)
  const inferred = (response.body.groups as Group[]).filter((group) => group.source === 'inferred')
  return Object.fromEntries(inferred.map((group) => [group.relation, group.results.map((result) => result.part.partNumber)]))
}

const HEADER = 'part_number,kind,name,family,year_from,year_to,bore_mm,compressed_thickness_mm,head_bolt_pattern'

describe('inferred fits follow the catalogue as it is written, without a reload', () => {
  let batchId: number

  it('judges a gasket again once an import changes its bore, and places a new gasket in part-number order', async () => {
    const before = await inferredGaskets()
    // The demo's TK18 gasket has an 84.5 mm bore: smaller than the block's 86 mm cylinders.
    expect(before['does-not-fit']).toContain('TM-HG-1800')
    const loads = t.services.graphIndex.loads

    const csv = `${HEADER}\nTM-HG-1800,head-gasket,TK18 head gasket,TK18,1986,1997,86.5,1.40,P10-A\nTM-HG-0100,head-gasket,Early gasket,TK20V,1992,2000,86.5,1.40,P10-A\n`
    const response = await uploadCsv(editor, csv, { type: 'parts', mode: 'commit' })
    expect(response.status, JSON.stringify(response.body)).toBe(201)
    batchId = response.body.batchId as number

    const after = await inferredGaskets()
    expect(after['does-not-fit'] ?? []).not.toContain('TM-HG-1800')
    expect(after.fits).toContain('TM-HG-1800')
    // Part-number order: the new number sorts before every demo gasket.
    expect(after.fits?.[0]).toBe('TM-HG-0100')
    // Completing a build reads the same classes: the new gasket is a candidate against the block.
    const completion = await editor.post('/api/builds/complete').send({ slots: { block: 'TM-BL-2000' } })
    expect(completion.status).toBe(200)
    const gaskets = completion.body.slots['head-gasket'].candidates.map((c: { part: { partNumber: string } }) => c.part.partNumber)
    expect(gaskets).toContain('TM-HG-0100')
    expect(t.services.graphIndex.loads).toBe(loads)
  })

  it('goes back to the old answers when the import is reverted', async () => {
    expect((await editor.post(`/api/imports/${batchId}/revert`)).status).toBe(200)
    const reverted = await inferredGaskets()
    expect(reverted['does-not-fit']).toContain('TM-HG-1800')
    expect(Object.values(reverted).flat()).not.toContain('TM-HG-0100')
  })
})
