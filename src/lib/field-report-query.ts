import type { LocationQuery, LocationQueryRaw } from 'vue-router'
import type { BuildContext, PairJudgement } from '@shared/schemas/build'
import { RELATIONS, type Relation } from '@shared/schemas/fitment'

export type StartingPair = { from: string; to: string; relation?: Relation }
export type StartingReport = { pairs: StartingPair[]; modelYear?: string; vin?: string }

const text = (value: unknown) => (typeof value === 'string' ? value.trim() : '')
const asRelation = (value: string | undefined) => (RELATIONS as readonly string[]).find((r) => r === value) as Relation | undefined

/** What a report form opens with, from its address: `from` and `to`, or `pair=A~B~relation` once per pair, and the car's year and VIN. */
export function startingReport(query: LocationQuery): StartingReport {
  const listed = ([] as unknown[]).concat(query.pair ?? []).flatMap((value): StartingPair[] => {
    const [from, to, relation] = text(value).split('~')
    return from && to ? [{ from, to, relation: asRelation(relation) }] : []
  })
  const from = text(query.from)
  const to = text(query.to)
  const pairs = from || to ? [{ from, to }, ...listed] : listed
  return { pairs, modelYear: text(query.year) || undefined, vin: text(query.vin) || undefined }
}

/** "Report how this build went": the sheet's judged pairs with the verdict each had, and the car. */
export function buildReportQuery(pairs: PairJudgement[], context: BuildContext): LocationQueryRaw {
  return {
    pair: pairs.map((pair) => [...pair.partNumbers, pair.relation === 'unknown' ? '' : pair.relation].join('~')),
    year: context.chassisModelYear === undefined ? undefined : String(context.chassisModelYear),
    vin: context.vin || undefined,
  }
}
