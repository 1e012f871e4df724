import { cpSync, mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs'
import { tmpdir } from 'node:os'
import path from 'node:path'
import { afterEach, describe, expect, it } from 'vitest'
import { RuleBook } from '../../server/reasoning/rule-book'
import { loadRules } from '../../server/reasoning/rule-loader'

let dir = ''
function copyRules() {
  dir = mkdtempSync(path.join(tmpdir(), 'fitwright-rules-'))
  cpSync('rules', dir, { recursive: true })
  return dir
}
afterEach(() => {
  if (dir) rmSync(dir, { recursive: true, force: true })
})

function edit(file: string, change: (json: Record<string, unknown>) => void) {
  const full = path.join(dir, file)
  const json = JSON.parse(readFileSync(full, 'utf8')) as Record<string, unknown>
  change(json)
  writeFileSync(full, JSON.stringify(json))
}
type Rules = {
  rules: {
    pair?: string[]
    conditions: { all: { operator: string; fact: string }[] }
    event: { type: string; params: Record<string, unknown> }
  }[]
}

describe('loadRules', () => {
  it('loads every shipped rule file and the catalogues', () => {
    const loaded = loadRules('rules')
    expect(loaded.files.length).toBeGreaterThanOrEqual(15)
    expect(loaded.modifications.map((m) => m.name)).toContain('hardened-washer-stack')
    expect(() => new RuleBook(loaded)).not.toThrow()
  })

  it.each([
    [
      'not JSON',
      'timing-drive.json',
      () => writeFileSync(path.join(dir, 'timing-drive.json'), '{ "id": '),
      /rules\/timing-drive\.json: not valid JSON/,
    ],
    [
      'an unknown operator',
      'oil-restrictor.json',
      () =>
        edit('oil-restrictor.json', (j) => {
          ;(j as unknown as Rules).rules[0]!.conditions.all[0]!.operator = 'roughly'
        }),
      /rules\/oil-restrictor\.json: .*unknown operator "roughly"/,
    ],
    [
      'an unknown fact',
      'oil-restrictor.json',
      () =>
        edit('oil-restrictor.json', (j) => {
          ;(j as unknown as Rules).rules[0]!.conditions.all[0]!.fact = 'weather'
        }),
      /unknown fact "weather"/,
    ],
    [
      'a pair that does not mate',
      'ignition-lead-cap.json',
      () =>
        edit('ignition-lead-cap.json', (j) => {
          ;(j as unknown as Rules).rules[0]!.pair = ['ignition-leads', 'block']
        }),
      /not a mating pair/,
    ],
    [
      'an unknown modification',
      'distributor-mount.json',
      () =>
        edit('distributor-mount.json', (j) => {
          ;(j as unknown as Rules).rules[1]!.event.params.modification = 'magic'
        }),
      /"magic" is not in catalogue\/modifications\.json/,
    ],
    [
      'an id that is not the file name',
      'shaft-fits.json',
      () =>
        edit('shaft-fits.json', (j) => {
          j.id = 'other-name'
        }),
      /must match the file name/,
    ],
    [
      'a relation in a build rule',
      'shop-safety.json',
      () =>
        edit('shop-safety.json', (j) => {
          ;(j as unknown as Rules).rules[0]!.event = { type: 'relation', params: { relation: 'fits', reason: 'x' } }
        }),
      /build rule may only add cautions/,
    ],
  ])('stops with the file and the fault for %s', (_label, _file, breakIt, message) => {
    copyRules()
    breakIt()
    expect(() => loadRules(dir)).toThrow(message)
  })
})

describe('RuleBook', () => {
  const book = new RuleBook(loadRules('rules'))

  it('never fires on a missing attribute', async () => {
    const outcomes = await book.evaluatePair('timing-belt', 'cam-gear', {
      'timing-belt': { profile: 'curvilinear' },
      'cam-gear': {},
      figures: {},
      input: {},
      slots: {},
    })
    expect(outcomes).toEqual([])
  })

  it('fills the reason from the facts', async () => {
    const outcomes = await book.evaluatePair('head-gasket', 'block', {
      'head-gasket': { boreMm: 84.5 },
      block: { boreMm: 86 },
      figures: {},
      input: {},
      slots: {},
    })
    expect(outcomes.map((o) => o.event)).toContainEqual({
      type: 'relation',
      params: { relation: 'does-not-fit', reason: expect.stringContaining('Gasket bore 84.5 mm is smaller than the 86 mm cylinder bore') },
    })
  })

  it('answers the same whichever way round the pair is given', async () => {
    const facts = { distributor: { mountPattern: 'DM-3' }, head: { distributorMount: 'DM-3' }, figures: {}, input: {}, slots: {} }
    expect(await book.evaluatePair('head', 'distributor', facts)).toEqual(await book.evaluatePair('distributor', 'head', facts))
  })
})
