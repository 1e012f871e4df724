import type { BareQueries } from './bare-queries'
import type { Client } from './http'
import type { PickedPart } from './picks'
import { figureLine, latencyLine, type Line } from './report'
import { failureReason, measureSync, type Pace, type Sample } from './stats'

const CLIENTS = 10

/**
 * Ten clients asking what fits (typical parts, in turn) as fast as answers
 * come, until `pace.requests` answers or the time budget is spent; against
 * the bare query's sequential rate.
 */
export async function measureConcurrentFits(counters: Client[], bare: BareQueries, parts: PickedPart[], pace: Pace): Promise<Line[]> {
  const sample: Sample = { times: [] }
  let issued = 0
  const started = performance.now()
  const worker = async (client: Client) => {
    while (
      issued < Math.max(pace.requests, CLIENTS * 5) &&
      !sample.failure &&
      (issued < CLIENTS * 2 || performance.now() - started < pace.budgetMs)
    ) {
      const part = parts[issued++ % parts.length]!
      const t = performance.now()
      try {
        await client.get(`/api/parts/${encodeURIComponent(part.number)}/fits`)
        sample.times.push(performance.now() - t)
      } catch (error) {
        sample.failure = failureReason(error)
      }
    }
  }
  await Promise.all(counters.slice(0, CLIENTS).map(worker))
  const wallS = (performance.now() - started) / 1000
  const baseline = measureSync((i) => bare.linksBothWays(parts[i % parts.length]!.id), pace)
  const bareRate = baseline.times.length / (baseline.times.reduce((sum, t) => sum + t, 0) / 1000)
  const rate = sample.times.length / wallS
  const label = `what fits, ${CLIENTS} concurrent clients`
  return [
    latencyLine(`${label}, latency`, sample, baseline, { p99: 100 }),
    sample.failure
      ? figureLine(`${label}, throughput`, `failed: ${sample.failure}`, '', '', '≥ 300 req/s', false)
      : figureLine(
          `${label}, throughput`,
          `${rate.toFixed(rate < 10 ? 2 : 0)} req/s`,
          `${Math.round(bareRate).toLocaleString('en')} req/s`,
          `${(rate / bareRate).toFixed(4)}`,
          '≥ 300 req/s',
          rate >= 300,
        ),
  ]
}
