import { afterEach, describe, expect, it, vi } from 'vitest'
import { useFieldReportForm } from '@/composables/useFieldReportForm'
import { buildReportQuery, startingReport } from '@/lib/field-report-query'
import { makePair } from '../../helpers/client-factories'

afterEach(() => vi.unstubAllGlobals())

describe('startingReport', () => {
  it.each([
    [{ from: 'TM-HD-2000', to: 'TM-BL-1800' }, [{ from: 'TM-HD-2000', to: 'TM-BL-1800' }]],
    [
      { pair: ['TM-HD-2000~TM-BL-1800', 'TM-DS-2000~TM-HD-1800'] },
      [
        { from: 'TM-HD-2000', to: 'TM-BL-1800' },
        { from: 'TM-DS-2000', to: 'TM-HD-1800' },
      ],
    ],
    [{ pair: 'broken' }, []],
    [{}, []],
  ])('reads %j as the pairs to start from', (query, expected) => {
    expect(startingReport(query).pairs).toEqual(expected.map((pair) => expect.objectContaining(pair)))
  })

  it('round-trips a build sheet: its pairs with their verdicts, the model year and the VIN', () => {
    const pairs = [makePair(['head', 'block'], 'fits-with-modification'), makePair(['distributor', 'head'], 'unknown')]
    pairs[0]!.partNumbers = ['TM-HD-2000', 'TM-BL-1800']
    pairs[1]!.partNumbers = ['TM-DS-2000', 'TM-HD-2000']
    const query = buildReportQuery(pairs, { chassisModelYear: 1996, vin: '1G4AH59H45G118341' })
    const start = startingReport(query as Parameters<typeof startingReport>[0])
    expect(start).toEqual({
      pairs: [
        { from: 'TM-HD-2000', to: 'TM-BL-1800', relation: 'fits-with-modification' },
        { from: 'TM-DS-2000', to: 'TM-HD-2000', relation: undefined },
      ],
      modelYear: '1996',
      vin: '1G4AH59H45G118341',
    })
  })
})

describe('useFieldReportForm', () => {
  it('names each wrong field by its path before sending anything', async () => {
    const fetch = vi.fn()
    vi.stubGlobal('fetch', fetch)
    const form = useFieldReportForm({ pairs: [{ from: 'TM-HD-2000', to: '' }] })
    form.pairs.value[0]!.relation = 'fits-with-modification'
    form.vehicle.modelYear = '1890'
    expect(await form.submit()).toBeNull()
    expect(form.errors.value).toMatchObject({
      'pairs.0.to': 'Give a part number.',
      'pairs.0.modifications': 'Name the modification the fit needed.',
      'vehicle.modelYear': 'Model year must be 1950 or later.',
    })
    expect(fetch).not.toHaveBeenCalled()
  })

  it('sends the report as JSON with each photo as a file, modifications split at commas', async () => {
    let sent: FormData | null = null
    vi.stubGlobal(
      'fetch',
      vi.fn(async (_url: string, init: RequestInit) => {
        sent = init.body as FormData
        return new Response(
          JSON.stringify({
            error: {
              code: 'validation',
              message: 'Unknown part number "TM-X".',
              details: [{ path: 'pairs.0.to', message: 'Unknown part number "TM-X".' }],
            },
          }),
          {
            status: 400,
            headers: { 'Content-Type': 'application/json' },
          },
        )
      }),
    )
    const form = useFieldReportForm({ pairs: [{ from: 'TM-HD-2000', to: 'TM-X' }] })
    form.pairs.value[0]!.relation = 'fits-with-modification'
    form.pairs.value[0]!.modifications = 'hardened-washer-stack, oil-restrictor-fit'
    form.photos.value = [new File([new Uint8Array([0xff, 0xd8, 0xff])], 'boss.jpg', { type: 'image/jpeg' })]
    expect(await form.submit()).toBeNull()
    const body = sent as unknown as FormData
    expect(JSON.parse(body.get('report') as string).pairs[0].modifications).toEqual(['hardened-washer-stack', 'oil-restrictor-fit'])
    expect((body.getAll('photos')[0] as File).name).toBe('boss.jpg')
    // The server's field message lands beside the field it names.
    expect(form.errors.value['pairs.0.to']).toBe('Unknown part number "TM-X".')
  })
})
