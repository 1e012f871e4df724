/** Times of one answer, or why it could not be measured. */
export type Sample = { times: number[]; failure?: string; /** The last answer, to show what was measured. */ last?: unknown }
export type Summary = { n: number; p50: number; p95: number; p99: number }

export function summarise(times: number[]): Summary {
  const sorted = [...times].sort((a, b) => a - b)
  const at = (p: number) => sorted[Math.max(0, Math.ceil((p / 100) * sorted.length) - 1)] ?? Number.NaN
  return { n: sorted.length, p50: at(50), p95: at(95), p99: at(99) }
}

export type Pace = { requests: number; warmup: number; budgetMs: number }
/** Enough requests for a p99 when the answer is quick; at least this many when it is slow. */
const FEWEST = 5

const reason = (error: unknown): string => {
  if (!(error instanceof Error)) return String(error)
  const cause = error.cause instanceof Error ? ` (${error.cause.message})` : ''
  return `${error.name === 'TimeoutError' ? 'timed out: ' : ''}${error.message}${cause}`
}

/**
 * Warm, sequential requests: `call(i)` may rotate through its inputs. Stops
 * after `requests`, or once the time budget is spent and a few are in. A
 * failure ends the answer's measurement and is reported instead of thrown.
 */
export async function measure(call: (i: number) => Promise<unknown>, pace: Pace): Promise<Sample> {
  const times: number[] = []
  try {
    const warmStart = performance.now()
    for (let i = 0; i < pace.warmup && performance.now() - warmStart < pace.budgetMs / 4; i++) await call(i)
    const started = performance.now()
    let last: unknown
    for (let i = 0; i < pace.requests && (i < FEWEST || performance.now() - started < pace.budgetMs); i++) {
      const t = performance.now()
      last = await call(i)
      times.push(performance.now() - t)
    }
    return { times, last }
  } catch (error) {
    return { times, failure: reason(error) }
  }
}

/** The same for a bare, synchronous baseline (no promise in the timed path). */
export function measureSync(call: (i: number) => unknown, pace: Pace): Sample {
  const times: number[] = []
  try {
    for (let i = 0; i < pace.warmup; i++) call(i)
    const started = performance.now()
    for (let i = 0; i < pace.requests && (i < FEWEST || performance.now() - started < pace.budgetMs); i++) {
      const t = performance.now()
      call(i)
      times.push(performance.now() - t)
    }
    return { times }
  } catch (error) {
    return { times, failure: reason(error) }
  }
}

export { reason as failureReason }
