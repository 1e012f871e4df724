import type { Caution } from '../../shared/schemas/build'

/** Weights against a candidate: more than any count of modifications, so legal and safe come first. */
const BLOCKED_PENALTY = 1000
const DANGER_PENALTY = 100
const CHECK_PENALTY = 10

export type Preference = { penalty: number; notes: string[] }

/**
 * How much a candidate is set back by what it brings into the build: a legal
 * blocker, a legal check or a new danger caution. Cautions the build already
 * raises without it (the lifting caution once a block is chosen) do not count.
 */
export function candidatePreference(cautions: Caution[], baseline: Caution[]): Preference {
  const known = new Set(baseline.map((caution) => caution.text))
  const added = cautions.filter((caution) => !known.has(caution.text))
  const notes: string[] = []
  let penalty = 0
  for (const caution of added) {
    if (caution.compliance === 'blocked') {
      penalty += BLOCKED_PENALTY
      notes.push(`Ranked lower, not road-legal: ${caution.text}`)
    } else if (caution.compliance === 'check') {
      penalty += CHECK_PENALTY
      notes.push(`Ranked lower, road-legality to check: ${caution.text}`)
    } else if (caution.severity === 'danger') {
      penalty += DANGER_PENALTY
      notes.push(`Ranked lower, raises a danger caution: ${caution.text}`)
    }
  }
  return { penalty, notes }
}

/** Whether a candidate was set back for legality or safety, not for its modifications. */
export const isSetBack = (preference: Preference) => preference.penalty > 0
