import { parseArgs } from 'node:util'
import type { Pace } from './stats'

export type ScaleOptions = { links: number; parts: number; pace: Pace; commitRows: number }

const whole = (name: string, value: string | undefined, fallback: number): number => {
  if (value === undefined) return fallback
  const number = Number(value.replace(/[_,]/g, ''))
  if (!Number.isInteger(number) || number < 1) throw new Error(`--${name} takes a whole number above zero, got "${value}".`)
  return number
}

/** `--links N` (100,000), `--parts N` (links / 10), `--commit N` rows (links / 4, at most 250,000), `--requests N` per answer (200), `--budget S` seconds per answer (15). */
export function scaleOptions(args: string[]): ScaleOptions {
  const { values } = parseArgs({
    args,
    allowPositionals: true,
    options: {
      links: { type: 'string' },
      parts: { type: 'string' },
      commit: { type: 'string' },
      requests: { type: 'string' },
      budget: { type: 'string' },
    },
  })
  const links = whole('links', values.links, 100_000)
  const parts = whole('parts', values.parts, Math.max(100, Math.round(links / 10)))
  return {
    links,
    parts,
    // The commit reads are measured during: 250,000 rows at full size, a quarter of the links below it, unless --commit says.
    commitRows: whole('commit', values.commit, Math.min(250_000, Math.round(links / 4))),
    pace: { requests: whole('requests', values.requests, 200), warmup: 3, budgetMs: whole('budget', values.budget, 15) * 1000 },
  }
}
