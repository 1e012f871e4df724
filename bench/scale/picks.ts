import type Database from 'better-sqlite3'
import { isSlotId } from '../../shared/build-template'
import { farthestFrom, type TypedGraph } from './typed-graph'

export type PickedPart = { id: number; number: string }
/** The parts and terms every answer is asked about, chosen from the loaded catalogue. */
export type Picks = {
  typical: (PickedPart & { links: number })[]
  hubs: (PickedPart & { links: number })[]
  paths: { from: PickedPart; to: PickedPart; steps: number }[]
  build: Record<string, string>
  numberPrefixes: string[]
  markPrefixes: string[]
  nameWords: string[]
}

export function pickParts(db: Database.Database, graph: TypedGraph): Picks {
  const degrees = db
    .prepare(
      `SELECT p.id, p.partNumber AS number, COUNT(*) AS links FROM (SELECT partAId AS id FROM link UNION ALL SELECT partBId FROM link) e
       JOIN part p ON p.id = e.id WHERE p.partNumber LIKE 'GX-%' AND p.kind <> 'other' GROUP BY p.id ORDER BY links`,
    )
    .all() as (PickedPart & { links: number })[]
  const middle = Math.floor(degrees.length / 2)
  const typical = degrees.slice(Math.max(0, middle - 10), middle + 10)
  const hubs = degrees.slice(-3).reverse()
  const paths = typical.slice(0, 5).map((from) => {
    const far = farthestFrom(graph, from.id)
    const to = db.prepare('SELECT id, partNumber AS number FROM part WHERE id = ?').get(far.part) as PickedPart
    return { from, to, steps: far.steps }
  })
  // One family's parts in every slot, as a counter would plan a build; the family with the most slots covered.
  const families = db
    .prepare(
      "SELECT family, kind, MIN(partNumber) AS number FROM part WHERE partNumber LIKE 'GX-%' AND partNumber GLOB '*[0-9]' GROUP BY family, kind",
    )
    .all() as { family: string; kind: string; number: string }[]
  const byFamily = new Map<string, Record<string, string>>()
  for (const row of families) if (isSlotId(row.kind)) byFamily.set(row.family, { ...byFamily.get(row.family), [row.kind]: row.number })
  const build = [...byFamily.values()].sort((a, b) => Object.keys(b).length - Object.keys(a).length)[0] ?? {}
  const marks = db
    .prepare("SELECT value FROM part_mark WHERE type = 'casting' AND value GLOB '[A-Z][0-9]*' LIMIT 20")
    .pluck()
    .all() as string[]
  return {
    typical,
    hubs,
    paths,
    build,
    numberPrefixes: typical.map((part) => part.number.slice(0, 10)),
    markPrefixes: marks.map((mark) => mark.slice(0, 6)),
    nameWords: ['uprated', 'economy', 'export', 'remanufactured'],
  }
}
