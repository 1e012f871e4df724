import { afterEach, describe, expect, it, vi } from 'vitest'
import { useSlotSuggestions } from '@/composables/useSlotSuggestions'
import { makeCandidate, makePart } from '../../helpers/client-factories'

afterEach(() => vi.unstubAllGlobals())

/** Stands in for the network edge: answers the completion and the parts search, and keeps what was sent. */
function stubServer(headNumber: string) {
  const sent: { path: string; body: unknown }[] = []
  vi.stubGlobal('fetch', async (url: string, init: RequestInit) => {
    const path = new URL(url, 'http://fitwright.test').pathname
    sent.push({ path, body: typeof init.body === 'string' ? JSON.parse(init.body) : null })
    const body =
      path === '/api/builds/complete'
        ? { slots: { head: { matesWith: ['block'], candidates: [makeCandidate(makePart(headNumber, 'head'))] } } }
        : { items: [], total: 0 }
    return new Response(JSON.stringify(body), { status: 200, headers: { 'Content-Type': 'application/json' } })
  })
  return sent
}

describe('useSlotSuggestions', () => {
  it('asks the server for candidates of its own slot only, and offers them', async () => {
    const sent = stubServer('TK18-HD-0410')
    const build = () => ({ slots: { block: 'TK18-BL-0107', head: 'TK18-HD-0001' }, context: { fuelOctane: 95 } })
    const suggestions = useSlotSuggestions('head', build)

    await suggestions.search('')

    const completion = sent.find((call) => call.path === '/api/builds/complete')
    expect(completion?.body).toEqual({ slots: { block: 'TK18-BL-0107' }, fuelOctane: 95, limit: 50, only: ['head'] })
    const offered = suggestions.groups.value.flatMap((group) => group.items.map((item) => item.part.partNumber))
    expect(offered).toContain('TK18-HD-0410')
  })
})
