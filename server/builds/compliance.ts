import type { Caution, Compliance } from '../../shared/schemas/build'

/**
 * Road-legality from the cautions that carry a legal weight: one blocker makes
 * the build not road-legal; without a chassis model year it cannot be judged.
 */
export function judgeCompliance(cautions: Caution[], chassisModelYear: number | undefined): Compliance {
  const blocked = cautions.filter((caution) => caution.compliance === 'blocked').map((caution) => caution.text)
  if (blocked.length) return { status: 'blocked', reasons: blocked }
  const check = cautions.filter((caution) => caution.compliance === 'check').map((caution) => caution.text)
  if (chassisModelYear === undefined) check.push('No chassis model year or VIN given: road-legality is not judged.')
  return check.length ? { status: 'check', reasons: check } : { status: 'ok', reasons: [] }
}
