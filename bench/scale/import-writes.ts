import { setTimeout as sleep } from 'node:timers/promises'
import type { Client } from './http'
import { commitImport } from './load'
import { figureLine, latencyLine, type Line } from './report'
import type { BareQueries } from './bare-queries'
import type { PickedPart } from './picks'
import { failureReason, measureSync, type Pace, type Sample } from './stats'

/** A 100-row links file committed into the loaded catalogue, end to end (upload to answer), one file per request. */
export async function measureSmallImports(importer: Client, files: string[]): Promise<Line> {
  const sample: Sample = { times: [] }
  for (const file of files) {
    const started = performance.now()
    try {
      await commitImport(importer, 'links', file)
      sample.times.push(performance.now() - started)
    } catch (error) {
      sample.failure = failureReason(error)
      break
    }
  }
  return latencyLine('links import, 100 rows, end to end', sample, null, { p95: 1000 })
}

type Reads = { health: Sample; fits: Sample }

/** Health and what fits (a typical part, in turn) asked alternately, 10 ms apart, until `until()` says stop. */
async function alternate(counter: Client, fitsRoute: (i: number) => string, until: () => boolean): Promise<Reads> {
  const reads: Reads = { health: { times: [] }, fits: { times: [] } }
  const timed = async (sample: Sample, route: string) => {
    const t = performance.now()
    try {
      await counter.get(route)
      sample.times.push(performance.now() - t)
    } catch (error) {
      sample.failure ??= failureReason(error)
    }
  }
  for (let i = 0; !until(); i++) {
    await timed(reads.health, '/api/health')
    await timed(reads.fits, fitsRoute(i))
    if (reads.health.failure && reads.fits.failure) break
    await sleep(10)
  }
  return reads
}

/**
 * `/api/health` and what fits asked alternately while a large links commit
 * runs, beside the same requests on the idle server just before and the bare
 * indexed query of what fits.
 */
export async function measureReadsDuringCommit(
  importer: Client,
  counter: Client,
  bare: BareQueries,
  typical: PickedPart[],
  file: string,
  rows: number,
  pace: Pace,
): Promise<Line[]> {
  const pick = (i: number) => typical[i % typical.length]!
  const fitsRoute = (i: number) => `/api/parts/${encodeURIComponent(pick(i).number)}/fits`
  let spent = 0
  const idleStarted = performance.now()
  const idle = await alternate(counter, fitsRoute, () => ++spent > pace.requests || performance.now() - idleStarted > pace.budgetMs)
  const bareFits = measureSync((i) => bare.linksBothWays(pick(i).id), pace)
  let done = false
  const started = performance.now()
  const commit = commitImport(importer, 'links', file)
    .then(
      (created) => ({ created, ms: performance.now() - started }),
      (error: unknown) => ({ error: failureReason(error) }),
    )
    .finally(() => {
      done = true
    })
  const during = await alternate(counter, fitsRoute, () => done)
  const result = await commit
  const size = `${rows.toLocaleString('en')}-row links commit`
  const lines = [
    latencyLine('/api/health, idle server', idle.health, null, {}),
    latencyLine(`/api/health during a ${size}`, during.health, idle.health, { p99: 100 }),
    latencyLine('what fits, typical part, idle server', idle.fits, bareFits, {}),
    latencyLine(`what fits, typical part, during a ${size}`, during.fits, bareFits, { p99: 100 }),
  ]
  if ('error' in result)
    return [
      ...lines,
      figureLine(`links commit of ${rows.toLocaleString('en')} rows under reads`, `failed: ${result.error}`, '', '', '', false),
    ]
  const rate = Math.round(result.created / (result.ms / 1000))
  return [
    ...lines,
    figureLine(
      `links commit of ${rows.toLocaleString('en')} rows under reads`,
      `${rate.toLocaleString('en')} rows/s, ${Math.round(result.ms).toLocaleString('en')} ms`,
      '',
      '',
      '',
      undefined,
    ),
  ]
}
