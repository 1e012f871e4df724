import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { expectBadRequest } from '../helpers/expect-error'
import { createTestApp, type TestApp } from '../helpers/test-app'

let t: TestApp
let counter: Awaited<ReturnType<TestApp['signIn']>>
type Near = { part: { partNumber: string }; distance: number }

beforeAll(async () => {
  t = await createTestApp()
  counter = await t.signIn('counter')
})
afterAll(() => t.close())

describe('GET /api/parts/lookup', () => {
  it('for an unknown number, answers the numbers a character or two away, nearest first, and none further', async () => {
    // TMBL2010 -> TMBL2000 one substitution, -> TMBL2001 two; TMBL2000HC is three away, TMBL1800 three.
    const response = await counter.get('/api/parts/lookup?q=TM-BL-2010')
    expect(response.status).toBe(200)
    expect(response.body.part).toBeNull()
    expect(response.body.near.map((near: Near) => [near.part.partNumber, near.distance])).toEqual([
      ['TM-BL-2000', 1],
      ['TM-BL-2001', 2],
    ])
  })

  it('finds a slip in the first character, which no prefix of the typed text reaches', async () => {
    const response = await counter.get('/api/parts/lookup?q=RM-BL-2001')
    expect(response.body.near.map((near: Near) => near.part.partNumber)).toContain('TM-BL-2001')
  })

  it('for a superseded number, answers the current part and the mark it was found by', async () => {
    const response = await counter.get('/api/parts/lookup?q=tm bl 1999')
    expect(response.body.part.partNumber).toBe('TM-BL-2000')
    expect(response.body.resolvedFrom).toEqual({ type: 'superseded', value: 'TM-BL-1999' })
  })

  it('lists the marks that contain the text with the parts that carry them', async () => {
    const response = await counter.get('/api/parts/lookup?q=C20-552')
    expect(response.body.part).toBeNull()
    const marks = response.body.marks.map(
      (m: { part: { partNumber: string }; mark: { value: string } }) => `${m.part.partNumber} ${m.mark.value}`,
    )
    expect(marks).toEqual(expect.arrayContaining(['TM-BL-2000 C20-5521', 'TM-BL-2001 C20-5521B']))
  })

  it('answers empty text with a 400 naming q', async () => {
    expectBadRequest(await counter.get('/api/parts/lookup?q=%20'), 'q')
  })
})

describe('GET /api/parts/:partNumber/fits by a superseded number', () => {
  it('answers the current part with resolvedFrom naming the superseded number', async () => {
    const response = await counter.get('/api/parts/TM-BL-1999/fits')
    expect(response.status).toBe(200)
    expect(response.body.part.partNumber).toBe('TM-BL-2000')
    expect(response.body.resolvedFrom).toEqual({ type: 'superseded', value: 'TM-BL-1999' })
  })

  it('answers resolvedFrom null for the part own number', async () => {
    expect((await counter.get('/api/parts/TM-BL-2000/fits')).body.resolvedFrom).toBeNull()
  })
})
