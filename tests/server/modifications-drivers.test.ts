import 'reflect-metadata'
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { ModificationService } from '../../server/catalogue/modification.service'
import type { ModificationSpec } from '../../server/reasoning/rule-file.schema'
import { databaseDrivers, type OpenedDatabase } from '../helpers/database-drivers'

const SHIPPED: ModificationSpec[] = [
  {
    name: 'md-washer-stack',
    title: 'Washer stack under one bolt',
    summary: 'A hardened washer stack where the boss sits higher.',
    steps: ['Measure the boss.', 'Fit the stack.'],
    extraParts: [{ description: 'Hardened washer', quantity: 2 }],
    consumables: ['thread sealant'],
    skillLevel: 'skilled',
    timeMinutes: 20,
    cautions: ['Torque to the service manual figure.', { text: 'Follow the tightening sequence.', manual: 'head bolt torque sequence' }],
  },
]

/** The modification catalogue read through the data port, on each driver. */
describe.each(databaseDrivers('modifications'))('modifications on $name', { timeout: 30_000 }, (driver) => {
  let opened: OpenedDatabase
  let modifications: ModificationService

  beforeAll(async () => {
    opened = await driver.open()
    modifications = new ModificationService(opened.dataSource)
    await modifications.syncShipped(SHIPPED)
  })
  afterAll(async () => opened.close())

  it('reads named modifications with their lists, and a stand-in for a name the catalogue lacks', async () => {
    const found = await modifications.byNames(['md-washer-stack', 'md-not-catalogued', 'md-washer-stack'])
    expect([...found.keys()]).toEqual(['md-washer-stack', 'md-not-catalogued'])
    expect(found.get('md-washer-stack')).toMatchObject({ ...SHIPPED[0], status: 'approved' })
    expect(found.get('md-not-catalogued')).toMatchObject({ name: 'md-not-catalogued' })
    expect((await modifications.list()).map((m) => m.name)).toContain('md-washer-stack')
  })
})
