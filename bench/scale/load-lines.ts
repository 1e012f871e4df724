import type { LoadTimings, ImportTiming } from './load'
import { figureLine, type Line } from './report'

const perSecond = (rate: number) => `${Math.round(rate).toLocaleString('en')} rows/s`

function rateLine(answer: string, timing: ImportTiming, raw: number | string | undefined): Line {
  const goal = raw === undefined ? '' : '≥ 0.5× raw'
  if (timing.failures.length) return figureLine(answer, `failed: ${timing.failures.join('; ')}`, '', '', goal, false)
  const rate = timing.rows / (timing.ms / 1000)
  if (raw === undefined) return figureLine(answer, perSecond(rate), '', '', '')
  if (typeof raw === 'string') return figureLine(answer, perSecond(rate), `raw failed: ${raw}`, '', goal)
  return figureLine(answer, perSecond(rate), `raw ${perSecond(raw)}`, (rate / raw).toFixed(2), goal, rate / raw >= 0.5)
}

/** Import rates of the load, beside a raw prepared insert of the same rows into an empty copy of the schema (or why that failed). */
export function importLines(load: LoadTimings, raw: { links: number; identities: number } | string): Line[] {
  return [
    rateLine('import, parts (load)', load.parts, undefined),
    rateLine('import, links (load)', load.links, typeof raw === 'string' ? raw : raw.links),
    rateLine('import, identity rows (load)', load.identities, typeof raw === 'string' ? raw : raw.identities),
  ]
}

export function memoryLine(afterMb: number, beforeMb: number): Line {
  return figureLine(
    'resident memory, graph built (benchmark and server in one process)',
    `${afterMb.toLocaleString('en')} MB`,
    `${beforeMb.toLocaleString('en')} MB before`,
    '',
    '≤ 500 MB',
    afterMb <= 500,
  )
}
