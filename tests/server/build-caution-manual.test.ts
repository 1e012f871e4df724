import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { createTestApp, type TestApp } from '../helpers/test-app'

let t: TestApp
let agent: Awaited<ReturnType<TestApp['signIn']>>
beforeAll(async () => {
  t = await createTestApp()
  agent = await t.signIn('tech')
})
afterAll(() => t.close())

type Caution = { severity: string; text: string; manual?: string; ruleId?: string }
type ModificationCaution = string | { text: string; manual: string }
const evaluate = async (request: object) => {
  const response = await agent.post('/api/builds/evaluate').send(request)
  expect(response.status).toBe(200)
  return response.body as { cautions: Caution[]; modifications: { name: string; cautions: ModificationCaution[] }[] }
}
const find = (cautions: Caution[], pattern: RegExp) => cautions.find((c) => pattern.test(c.text))

describe('cautions point to the service manual section that governs them', () => {
  const job = { block: 'TM-BL-2000', head: 'TM-HD-2000', 'head-bolt': 'TM-HB-2000', 'timing-belt': 'TM-TB-2000', ecu: 'TM-EC-2000' }

  it('names the section beside each shop caution, and lists every usual shop caution', async () => {
    const { cautions } = await evaluate({ slots: job, engineOut: true })
    expect(find(cautions, /Torque-to-yield head bolts/)?.manual).toBe('head bolt torque sequence and angle')
    expect(find(cautions, /blind head-bolt holes/)?.manual).toBe('head bolt holes and thread repair')
    expect(find(cautions, /two full turns of the crank/)?.manual).toBe('timing marks and belt tension')
    const fluids = find(cautions, /coolant scalds/)!
    expect(fluids.text).toMatch(/dispose of coolant, oil and fuel under local rules/)
    expect(fluids.text).toMatch(/Wear eye protection/)
    expect(fluids.manual).toBe('cooling system draining, filling and bleeding')
    expect(find(cautions, /Lifting an engine/)?.manual).toBe('engine removal and lifting points')
    expect(find(cautions, /Disconnect the battery negative/)?.manual).toBe('battery disconnection and airbag wait time')
  })

  it('gives the lifting caution only when the job lifts the engine', async () => {
    expect(find((await evaluate({ slots: job })).cautions, /Lifting an engine/)).toBeUndefined()
    expect(find((await evaluate({ slots: job, engineOut: false })).cautions, /Lifting an engine/)).toBeUndefined()
    expect(find((await evaluate({ slots: job, engineOut: true })).cautions, /Lifting an engine/)?.severity).toBe('danger')
  })

  it("carries a modification's caution with its manual section, and plain cautions as text", async () => {
    const { modifications } = await evaluate({ slots: { head: 'TM-HD-1800', distributor: 'TM-DS-2000' } })
    const transfer = modifications.find((m) => m.name === 'distributor-internals-transfer')!
    expect(transfer.cautions).toEqual([
      {
        text: 'An offset drive tang fits only one way round: check it before forcing the housing home.',
        manual: 'distributor removal, drive tang and base timing',
      },
    ])
    const plate = await evaluate({ slots: { head: 'TM-HD-1800', distributor: 'TM-DS-2008' } })
    const longer = plate.modifications.find((m) => m.name === 'longer-drive-dog')!
    expect(longer.cautions[0]).toBe('Eye protection when driving roll pins.')
    expect(longer.cautions[1]).toMatchObject({ manual: 'distributor removal, drive tang and base timing' })
  })
})
