import { setTimeout as sleep } from 'node:timers/promises'
import type { Client } from './http'
import { commitImport } from './load'
import { figureLine, latencyLine, type Line } from './report'
import { failureReason, measure, type Pace, type Sample } from './stats'

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

/**
 * `/api/health` asked every 10 ms while a large links commit runs, against
 * the same request on the idle server just before.
 */
export async function measureHealthDuringCommit(
  importer: Client,
  counter: Client,
  file: string,
  rows: number,
  pace: Pace,
): Promise<Line[]> {
  const idle = await measure(() => counter.get('/api/health'), pace)
  const during: Sample = { times: [] }
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
  while (!done) {
    const t = performance.now()
    try {
      await counter.get('/api/health')
      during.times.push(performance.now() - t)
    } catch (error) {
      during.failure = failureReason(error)
      break
    }
    await sleep(10)
  }
  const result = await commit
  const label = `/api/health during a ${rows.toLocaleString('en')}-row links commit`
  const health = latencyLine(label, during, idle, { p99: 100 })
  if ('error' in result)
    return [
      health,
      figureLine(`links commit of ${rows.toLocaleString('en')} rows under reads`, `failed: ${result.error}`, '', '', '', false),
    ]
  const rate = Math.round(result.created / (result.ms / 1000))
  return [
    health,
    figureLine(
      `links commit of ${rows.toLocaleString('en')} rows under reads`,
      `${rate.toLocaleString('en')} rows/s`,
      '',
      '',
      '',
      undefined,
    ),
  ]
}
