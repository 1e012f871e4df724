import { summarise, type Sample } from './stats'

/** One line of the final table; figures are already formatted. */
export type Line = {
  answer: string
  n: string
  p50: string
  p95: string
  p99: string
  baseline: string
  ratio: string
  goal: string
  verdict: 'met' | 'missed' | 'failed' | ''
}
/** A latency goal: p95 (or p99) at most so many ms, and within so many times the baseline's p50. */
export type LatencyGoal = { p95?: number; p99?: number; within?: number }

export const ms = (value: number) =>
  Number.isNaN(value)
    ? '—'
    : value < 1
      ? `${value.toFixed(3)} ms`
      : value < 100
        ? `${value.toFixed(1)} ms`
        : `${Math.round(value).toLocaleString('en')} ms`
export const times = (value: number) => (value < 10 ? `${value.toFixed(1)}×` : `${Math.round(value).toLocaleString('en')}×`)

function goalText(goal: LatencyGoal): string {
  const parts = [
    goal.p95 !== undefined ? `p95 ≤ ${goal.p95} ms` : '',
    goal.p99 !== undefined ? `p99 < ${goal.p99} ms` : '',
    goal.within ? `≤ ${goal.within}× bare` : '',
  ]
  return parts.filter(Boolean).join(', ')
}

export function latencyLine(answer: string, sample: Sample, baseline: Sample | null, goal: LatencyGoal): Line {
  const text = goalText(goal)
  if (sample.failure !== undefined || sample.times.length === 0) {
    return {
      answer,
      n: String(sample.times.length),
      p50: `failed: ${sample.failure ?? 'no answer'}`,
      p95: '',
      p99: '',
      baseline: '',
      ratio: '',
      goal: text,
      verdict: 'failed',
    }
  }
  const own = summarise(sample.times)
  const bare = baseline && !baseline.failure && baseline.times.length ? summarise(baseline.times) : null
  const ratio = bare ? own.p50 / bare.p50 : Number.NaN
  const met =
    (goal.p95 === undefined || own.p95 <= goal.p95) &&
    (goal.p99 === undefined || own.p99 < goal.p99) &&
    (!goal.within || (bare !== null && ratio <= goal.within))
  return {
    answer,
    n: String(own.n),
    p50: ms(own.p50),
    p95: ms(own.p95),
    p99: ms(own.p99),
    baseline: bare ? ms(bare.p50) : baseline?.failure ? `failed: ${baseline.failure}` : '',
    ratio: bare ? times(ratio) : '',
    goal: text,
    verdict: text ? (met ? 'met' : 'missed') : '',
  }
}

/** A line that is one figure against a baseline figure (rows/s, MB, requests/s). */
export function figureLine(answer: string, figure: string, baseline: string, ratio: string, goal: string, met?: boolean): Line {
  return { answer, n: '', p50: figure, p95: '', p99: '', baseline, ratio, goal, verdict: met === undefined ? '' : met ? 'met' : 'missed' }
}

export function failedLine(answer: string, reason: string, goal: string): Line {
  return { answer, n: '0', p50: `failed: ${reason}`, p95: '', p99: '', baseline: '', ratio: '', goal, verdict: 'failed' }
}

export function printTable(lines: Line[]) {
  const header: Line = {
    answer: 'answer',
    n: 'n',
    p50: 'p50',
    p95: 'p95',
    p99: 'p99',
    baseline: 'baseline p50',
    ratio: 'ratio',
    goal: 'goal',
    verdict: '',
  }
  const columns = Object.keys(header) as (keyof Line)[]
  const widths = columns.map((column) => Math.max(...[header, ...lines].map((line) => line[column].length)))
  const row = (line: Line) => `| ${columns.map((column, i) => line[column].padEnd(widths[i]!)).join(' | ')} |`
  console.log(row(header))
  console.log(`|${widths.map((width) => '-'.repeat(width + 2)).join('|')}|`)
  for (const line of lines) console.log(row(line))
}
