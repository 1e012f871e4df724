import { normalisePartCode } from '../../shared/schemas/part'
import type { BareQueries } from './bare-queries'
import type { Client } from './http'
import type { Picks } from './picks'
import { latencyLine, type LatencyGoal, type Line } from './report'
import { measure, measureSync, type Pace } from './stats'
import { distancesFrom, type TypedGraph } from './typed-graph'

type ReadAnswer = { answer: string; goal: LatencyGoal; call: (i: number) => Promise<unknown>; bare: (i: number) => unknown }

const at = <T>(values: T[], i: number): T => values[i % values.length]!
const pn = (number: string) => encodeURIComponent(number)
/** The slots left empty for completion and fill: kinds with many candidates. */
export const EMPTY_SLOTS = ['head-gasket', 'timing-belt', 'injector']

function answers(counter: Client, bare: BareQueries, graph: TypedGraph, picks: Picks): ReadAnswer[] {
  const search = { p95: 10, within: 5 }
  const build = picks.build
  const partial = Object.fromEntries(Object.entries(build).filter(([slot]) => !EMPTY_SLOTS.includes(slot)))
  const filledIds = Object.values(partial).map((number) => bare.partId(number))
  return [
    {
      answer: 'search, part-number prefix',
      goal: search,
      call: (i) => counter.get(`/api/parts?q=${encodeURIComponent(at(picks.numberPrefixes, i))}`),
      bare: (i) => bare.searchNumberPrefix(normalisePartCode(at(picks.numberPrefixes, i))),
    },
    {
      answer: 'search, casting-mark prefix',
      goal: search,
      call: (i) => counter.get(`/api/parts?q=${encodeURIComponent(at(picks.markPrefixes, i))}`),
      bare: (i) => bare.searchMarkPrefix(normalisePartCode(at(picks.markPrefixes, i))),
    },
    {
      answer: 'search, name word',
      goal: search,
      call: (i) => counter.get(`/api/parts?q=${at(picks.nameWords, i)}`),
      bare: (i) => bare.searchNameWord(at(picks.nameWords, i)),
    },
    {
      answer: 'what fits, typical part',
      goal: { p95: 20, within: 5 },
      call: (i) => counter.get(`/api/parts/${pn(at(picks.typical, i).number)}/fits`),
      bare: (i) => bare.linksBothWays(at(picks.typical, i).id),
    },
    {
      answer: 'what fits, reviewed only',
      goal: {},
      call: (i) => counter.get(`/api/parts/${pn(at(picks.typical, i).number)}/fits?inferred=0`),
      bare: (i) => bare.linksBothWays(at(picks.typical, i).id),
    },
    {
      answer: 'what fits, hub part',
      goal: { p95: 150, within: 2 },
      call: (i) => counter.get(`/api/parts/${pn(at(picks.hubs, i).number)}/fits`),
      bare: (i) => bare.linksBothWays(at(picks.hubs, i).id),
    },
    {
      answer: 'path, two distant parts',
      goal: { p95: 50, within: 3 },
      call: (i) => counter.get(`/api/graph/path?from=${pn(at(picks.paths, i).from.number)}&to=${pn(at(picks.paths, i).to.number)}`),
      bare: (i) => distancesFrom(graph, at(picks.paths, i).from.id, at(picks.paths, i).to.id),
    },
    {
      answer: 'neighbourhood, 2 steps, hub',
      goal: { p95: 30, within: 3 },
      call: (i) => counter.get(`/api/graph/neighbourhood/${pn(at(picks.hubs, i).number)}?depth=2`),
      bare: (i) => bare.neighbourhood(at(picks.hubs, i).id),
    },
    {
      answer: `evaluate, ${Object.keys(build).length} slots`,
      goal: { p95: 15 },
      call: () => counter.send('POST', '/api/builds/evaluate', { slots: build }),
      bare: () => bare.buildPairs(Object.values(build)),
    },
    {
      answer: 'complete, 3 empty slots',
      goal: { p95: 150 },
      call: () => counter.send('POST', '/api/builds/complete', { slots: partial }),
      bare: () => bare.completionReads(filledIds, EMPTY_SLOTS),
    },
    {
      answer: 'fill the gaps, 3 empty slots',
      goal: { p95: 300 },
      call: () => counter.send('POST', '/api/builds/fill', { slots: partial }),
      bare: () => bare.completionReads(filledIds, EMPTY_SLOTS),
    },
  ]
}

/** What an answer held, so the log shows the work was real (an empty answer would be quick for the wrong reason). */
function gist(body: unknown): string {
  if (typeof body !== 'object' || body === null) return 'no answer'
  const answer = body as Record<string, unknown>
  const count = (key: string) => (Array.isArray(answer[key]) ? (answer[key] as unknown[]).length : 0)
  if ('total' in answer) return `${count('items')} of ${String(answer.total)} parts`
  if ('groups' in answer && Array.isArray(answer.groups)) {
    const groups = answer.groups as { total: number; results: unknown[] }[]
    const total = groups.reduce((sum, group) => sum + group.total, 0)
    return `${groups.reduce((sum, group) => sum + group.results.length, 0)} of ${total} results in ${groups.length} groups`
  }
  if ('found' in answer) return answer.found ? `found, ${count('edges')} steps` : 'no path'
  if ('capped' in answer) return `${count('nodes')} parts, ${count('edges')} links${answer.capped ? ', capped' : ''}`
  if ('verdict' in answer) return `verdict ${String(answer.verdict)}, ${count('pairs')} pairs`
  if ('filled' in answer) return `${count('filled')} filled, ${count('unfilled')} unfilled`
  if ('slots' in answer && typeof answer.slots === 'object' && answer.slots)
    return `${Object.values(answer.slots as Record<string, { candidates?: unknown[] }>)
      .map((slot) => slot.candidates?.length ?? 0)
      .join('+')} candidates`
  return 'answered'
}

/** Every read answer of the goals table, each followed at once by its bare baseline. */
export async function measureReads(counter: Client, bare: BareQueries, graph: TypedGraph, picks: Picks, pace: Pace): Promise<Line[]> {
  const lines: Line[] = []
  for (const read of answers(counter, bare, graph, picks)) {
    const sample = await measure(read.call, pace)
    const baseline = measureSync(read.bare, pace)
    const line = latencyLine(read.answer, sample, baseline, read.goal)
    console.log(`  ${read.answer}: p50 ${line.p50}, p95 ${line.p95} (${line.n} requests; ${gist(sample.last)}); bare p50 ${line.baseline}`)
    lines.push(line)
  }
  return lines
}
